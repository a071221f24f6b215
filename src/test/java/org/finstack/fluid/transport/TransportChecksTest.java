package org.finstack.fluid.transport;

import static org.finstack.testing.Reference.assertRelative;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.finstack.core.Citation;
import org.finstack.core.FinstackException;
import org.finstack.core.OutOfRangeException;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.Fluids;
import org.finstack.fluid.HelmholtzFluid;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.SaturationState;
import org.finstack.fluid.TransportProperties;
import org.junit.jupiter.api.Test;

/** Worked examples, published check values, invariants and refusals of the transport properties. */
class TransportChecksTest {

    @Test
    void chapmanEnskogJavadocExample() {
        // ChapmanEnskog Javadoc worked example; Neufeld et al. 1972 fit evaluated by hand (python3)
        assertRelative(1.59078, ChapmanEnskog.collisionIntegral(300 / 299.363), 1e-5, "Omega22*");
        assertRelative(1.33501e-5, ChapmanEnskog.viscosity(0.102032, 300, 0.46893e-9, 299.363), 1e-5, "eta0");
    }

    @Test
    void mulero2012JavadocExampleR134a() {
        // Mulero, Cachadina & Parra 2012: R134a sigma1 = 0.05801 N/m, n1 = 1.241, Tc = 374.21 K
        Mulero2012SurfaceTension s = new Mulero2012SurfaceTension(374.21, new double[] {0.05801},
                new double[] {1.241}, Mulero2012SurfaceTension.SOURCE);
        assertRelative(0.011427, s.at(273.15), 1e-4, "R134a surface tension at 0 degC");
        assertRelative(0.011427, Fluids.byName("R134a").transport().surfaceTension(273.15), 1e-4, "via the fluid");
    }

    @Test
    void laeseckeMuzny2017JavadocExample() {
        // LaeseckeMuzny2017Viscosity Javadoc example; CoolProp 8.0.0 gives 1.50031e-5 Pa s at 300 K, 0.1 MPa
        Fluid co2 = Fluids.byName("R744");
        FluidState s = co2.at(InputPair.TP, 300, 1e5);
        assertRelative(1.7730, s.density(), 1e-4, "CO2 density at 300 K, 0.1 MPa");
        assertRelative(1.5003e-5, co2.transport().viscosity(s), 1e-4, "CO2 viscosity at 300 K, 0.1 MPa");
    }

    @Test
    void huber2016Co2DiluteConductivity() {
        // Huber et al. 2016 (J. Phys. Chem. Ref. Data 45:013102), Table 7 check value: 250 K, zero density,
        // 12.99 mW/(m K) (from memory)
        Fluid co2 = Fluids.byName("R744");
        FluidState s = ((HelmholtzFluid) co2).atTemperatureDensity(250, 1e-6);
        assertRelative(12.99e-3, co2.transport().conductivity(s), 5e-4, "CO2 dilute conductivity at 250 K");
    }

    @Test
    void saturatedTrendsForEveryFluid() {
        for (Fluid f : Fluids.all()) {
            TransportProperties tp = f.transport();
            double[] prev = null;
            double tTop = Math.min(333.15, f.info().criticalTemperature() - 1);
            for (double t = 223.15; t <= tTop; t += 10) {
                SaturationState s = f.saturationAtTemperature(t);
                double[] now = {tp.viscosity(s.liquid()), tp.viscosity(s.vapour()), tp.conductivity(s.liquid()),
                    tp.surfaceTension(t)};
                String at = f.name() + " at " + t + " K";
                if (prev != null) {
                    assertTrue(now[0] < prev[0], at + ": liquid viscosity falls with temperature");
                    assertTrue(now[1] > prev[1], at + ": vapour viscosity rises with temperature");
                    assertTrue(now[2] < prev[2], at + ": liquid conductivity falls with temperature");
                    assertTrue(now[3] < prev[3], at + ": surface tension falls with temperature");
                }
                assertTrue(now[0] > now[1], at + ": liquid more viscous than vapour");
                prev = now;
            }
            double tc = f.info().criticalTemperature();
            assertTrue(tp.surfaceTension(tc) < 1e-5, f.name() + ": surface tension vanishes at Tc");
            assertTrue(tp.surfaceTension(tc - 0.5) < tp.surfaceTension(tc - 5), f.name() + ": falls towards Tc");
            assertTrue(tp.accuracy().startsWith(f.name()), f.name() + " accuracy sentence");
            assertTrue(tp.sources().size() >= 2, f.name() + " sources");
        }
    }

    @Test
    void sourcesNameTheCorrelations() {
        assertTrue(Fluids.byName("R744").transport().sources().stream().map(Citation::key)
                .anyMatch(k -> k.equals("Laesecke & Muzny 2017")));
        assertTrue(Fluids.byName("R143a").transport().sources().stream().map(Citation::key)
                .anyMatch(k -> k.startsWith("Klein")));
    }

    @Test
    void twoPhaseStateIsRefused() {
        Fluid f = Fluids.byName("R134a");
        FluidState wet = f.at(InputPair.TQ, 273.15, 0.5);
        FinstackException e = assertThrows(FinstackException.class, () -> f.transport().viscosity(wet));
        assertTrue(e.getMessage().contains("saturated liquid and vapour"), e.getMessage());
        assertThrows(FinstackException.class, () -> f.transport().conductivity(wet));
    }

    @Test
    void outOfRangeIsRefused() {
        TransportProperties tp = Fluids.byName("R290").transport();
        assertThrows(OutOfRangeException.class, () -> tp.surfaceTension(10));
        assertThrows(OutOfRangeException.class, () -> tp.surfaceTension(400));
        assertThrows(org.finstack.core.InputException.class, () -> tp.surfaceTension(Double.NaN));
    }

    @Test
    void transportIsBuiltOnceAndShared() {
        Fluid f = Fluids.byName("R32");
        assertEquals(f.transport(), f.transport());
    }
}
