package org.finstack.fluid.transport;

import static org.finstack.testing.Reference.assertRelative;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.finstack.core.Citation;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.core.OutOfRangeException;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.Fluids;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.SaturationState;
import org.finstack.fluid.TransportProperties;
import org.junit.jupiter.api.Test;

/** Worked examples, invariants and refusals of the blend transport properties. */
class BlendTransportChecksTest {

    // Geller, Bivens & Yokozeki 2000, R410A: a_i [micro-Pa s / K^i], b_j [micro-Pa s / (kg/m3)^j]
    // (r410a.json, converted back from CoolProp 8.0.0's SI coefficients by the generating script)
    private static final double[] VISC_A = {-2.695, 0.0585, -2.129e-05};
    private static final double[] VISC_B = {0.009047, 5.784e-05, 1.309e-07, -2.422e-10, 9.424e-14, 3.933e-17};
    // Geller, Nemzer & Cheremnykh 2001, R410A: a_i [mW/(m K) / K^i], b_j [mW/(m K) / (kg/m3)^j] (same route)
    private static final double[] COND_A = {-8.872, 0.0741};
    private static final double[] COND_B = {0.03576, -9.045e-06, 4.343e-08, -3.705e-12};

    @Test
    void gellerBivensYokozeki2000JavadocExampleR410A() {
        // Javadoc worked example, evaluated by hand (python3) from the coefficients above
        var v = new GellerBivensYokozeki2000Viscosity(VISC_A, VISC_B);
        assertRelative(164.758e-6, v.at(273.15, 1170), 1e-5, "R410A viscosity at 273.15 K, 1170 kg/m3");
        // dilute part: -2.695 + 0.0585 T - 2.129e-5 T^2 micro-Pa s at 300 K = 12.9389 (by hand)
        assertRelative(12.9389e-6, v.dilute(300), 1e-5, "R410A dilute-gas viscosity at 300 K");
    }

    @Test
    void gellerNemzerCheremnykh2001JavadocExampleR410A() {
        // Javadoc worked example, evaluated by hand (python3) from the coefficients above
        var c = new GellerNemzerCheremnykh2001Conductivity(COND_A, COND_B);
        assertRelative(103.441e-3, c.at(273.15, 1170), 1e-5, "R410A conductivity at 273.15 K, 1170 kg/m3");
        assertRelative(12.4342e-3, c.at(273.15, 30), 1e-5, "R410A conductivity at 273.15 K, 30 kg/m3");
    }

    @Test
    void okada1999JavadocExampleR410A() {
        // Okada et al. 1999 for R410A: sigma_1 = 0.06238 N/m, n_1 = 1.246, Tc = 344.56 K (CoolProp 8.0.0 data)
        var s = new Okada1999SurfaceTension(344.56, new double[] {0.06238}, new double[] {1.246});
        assertRelative(0.00877803, s.at(273.15), 1e-5, "R410A surface tension at 273.15 K");
        assertEquals(0, s.at(344.56), "zero at the correlation's Tc");
        assertRelative(0.00877803, Fluids.byName("R410A").transport().surfaceTension(273.15), 1e-5, "via the blend");
    }

    @Test
    void blendUsesTheJavadocCoefficients() {
        // the worked example's state through the blend: bubble-point liquid of R410A at 0 degC
        // (1169.946 kg/m3, fluid-blend-saturation.csv) is close to 1170 kg/m3
        Fluid f = Fluids.byName("R410A");
        FluidState l = f.saturationAtTemperature(273.15).liquid();
        var v = new GellerBivensYokozeki2000Viscosity(VISC_A, VISC_B);
        var c = new GellerNemzerCheremnykh2001Conductivity(COND_A, COND_B);
        assertRelative(v.at(l.temperature(), l.density()), f.transport().viscosity(l), 1e-12, "viscosity");
        assertRelative(c.at(l.temperature(), l.density()), f.transport().conductivity(l), 1e-12, "conductivity");
    }

    @Test
    void saturatedTrendsForEveryBlend() {
        for (String name : Fluids.blendNames()) {
            Fluid f = Fluids.byName(name);
            TransportProperties tp = f.transport();
            double[] prev = null;
            for (double t = 223.15; t <= 333.15 + 1e-9; t += 5) {
                SaturationState s = f.saturationAtTemperature(t);
                double[] now = {tp.viscosity(s.liquid()), tp.viscosity(s.vapour()), tp.conductivity(s.liquid()),
                    tp.conductivity(s.vapour()), tp.surfaceTension(t)};
                String at = name + " at " + t + " K";
                if (prev != null) {
                    assertTrue(now[0] < prev[0], at + ": bubble-point liquid viscosity falls with temperature");
                    assertTrue(now[1] > prev[1], at + ": dew-point vapour viscosity rises with temperature");
                    assertTrue(now[2] < prev[2], at + ": bubble-point liquid conductivity falls with temperature");
                    assertTrue(now[3] > prev[3], at + ": dew-point vapour conductivity rises with temperature");
                    assertTrue(now[4] < prev[4], at + ": surface tension falls with temperature");
                }
                assertTrue(now[0] > now[1], at + ": liquid more viscous than vapour");
                assertTrue(now[2] > now[3], at + ": liquid conducts better than vapour");
                prev = now;
            }
            double tc = f.info().criticalTemperature();
            assertTrue(tp.surfaceTension(tc) < 1e-5, name + ": surface tension vanishes at Tc");
            assertTrue(tp.accuracy().startsWith(name), name + " accuracy sentence");
        }
    }

    @Test
    void compressedLiquidIsMoreViscousThanSaturated() {
        // invariant: at fixed temperature, viscosity and conductivity rise with pressure (density)
        for (String name : Fluids.blendNames()) {
            Fluid f = Fluids.byName(name);
            FluidState sat = f.saturationAtTemperature(273.15).liquid();
            FluidState comp = f.at(InputPair.TP, 273.15, sat.pressure() + 5e6);
            assertTrue(f.transport().viscosity(comp) > f.transport().viscosity(sat), name + " viscosity");
            assertTrue(f.transport().conductivity(comp) > f.transport().conductivity(sat), name + " conductivity");
        }
    }

    @Test
    void positiveOrRefusedOverTheWholeRange() {
        // across the equation of state's range: a finite positive value, or OutOfRangeException; never NaN
        for (String name : Fluids.blendNames()) {
            Fluid f = Fluids.byName(name);
            TransportProperties tp = f.transport();
            for (double t = 200; t <= 500; t += 25) {
                for (double p : new double[] {1e3, 1e5, 1e6, 5e6, 2e7, 5e7}) {
                    FluidState s;
                    try {
                        s = f.at(InputPair.TP, t, p);
                    } catch (OutOfRangeException e) {
                        continue;
                    }
                    if (!s.hasSinglePhaseProperties()) {
                        continue;
                    }
                    for (int k = 0; k < 2; k++) {
                        try {
                            double v = k == 0 ? tp.viscosity(s) : tp.conductivity(s);
                            assertTrue(v > 0 && Double.isFinite(v), name + " at " + t + " K, " + p + " Pa");
                        } catch (OutOfRangeException e) {
                            assertTrue(e.getMessage().contains(name), e.getMessage());
                        }
                    }
                }
            }
        }
    }

    @Test
    void sourcesNameThePapers() {
        List<String> keys = Fluids.byName("R407C").transport().sources().stream().map(Citation::key).toList();
        assertEquals(List.of("Geller, Bivens & Yokozeki 2000", "Geller, Nemzer & Cheremnykh 2001", "Okada et al. 1999"),
                keys);
        assertEquals(GellerBivensYokozeki2000Viscosity.SOURCE.key(), keys.get(0));
        assertEquals(GellerNemzerCheremnykh2001Conductivity.SOURCE.key(), keys.get(1));
        assertEquals(Okada1999SurfaceTension.SOURCE.key(), keys.get(2));
    }

    @Test
    void twoPhaseStateIsRefused() {
        Fluid f = Fluids.byName("R407C");
        FluidState wet = f.at(InputPair.TQ, 273.15, 0.5);
        FinstackException e = assertThrows(FinstackException.class, () -> f.transport().viscosity(wet));
        assertTrue(e.getMessage().contains("bubble point"), e.getMessage());
        assertThrows(FinstackException.class, () -> f.transport().conductivity(wet));
    }

    @Test
    void badInputIsRefused() {
        TransportProperties tp = Fluids.byName("R404A").transport();
        assertThrows(InputException.class, () -> tp.viscosity(null));
        assertThrows(InputException.class, () -> tp.conductivity(null));
        assertThrows(InputException.class, () -> tp.surfaceTension(Double.NaN));
        assertThrows(OutOfRangeException.class, () -> tp.surfaceTension(150));
        assertThrows(OutOfRangeException.class, () -> tp.surfaceTension(400));
        assertThrows(InputException.class, () -> BlendTransport.forBlend(null));
        assertThrows(FinstackException.class, () -> BlendTransport.forBlend(Fluids.byName("R134a")));
        assertThrows(InputException.class, () -> new GellerBivensYokozeki2000Viscosity(null, VISC_B));
        assertThrows(InputException.class,
                () -> new GellerNemzerCheremnykh2001Conductivity(new double[] {Double.NaN}, COND_B));
        assertThrows(InputException.class,
                () -> new Okada1999SurfaceTension(344.56, new double[] {0.06}, new double[] {1.2, 1.3}));
    }

    @Test
    void transportIsBuiltOnceAndShared() {
        Fluid f = Fluids.byName("R507A");
        assertSame(f.transport(), f.transport());
    }
}
