package org.finstack.fluid.transport;

import static org.finstack.testing.Reference.assertRelative;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.Fluids;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.Phase;
import org.finstack.fluid.SaturationState;
import org.finstack.fluid.TransportProperties;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/**
 * The four pseudo-pure blends against reference data from CoolProp 8.0.0 (Bell et al., Ind. Eng.
 * Chem. Res. 53 (2014) 2498-2508), an independent implementation of the same published blend
 * correlations on the same equations of state (Lemmon 2003):
 * {@code reference/fluid-transport-blend-saturation.csv} (bubble-point liquid and dew-point vapour,
 * -50..+60 degC every 10 K) and {@code fluid-transport-blend-states.csv} (single-phase), generated
 * by {@code scripts/fluid_transport_blend_reference.py reference}. Tolerances are the accuracy
 * BlendTransport states per blend and phase.
 */
class BlendTransportReferenceTest {

    /** Blend index of the CSV files (the script's BLENDS order). */
    private static final List<String> INDEX = List.of("R410A", "R404A", "R407C", "R507A");

    /** Stated accuracy: liquid and vapour viscosity, liquid and vapour conductivity, surface tension. */
    private static final Map<String, double[]> STATED = Map.of(
            "R410A", new double[] {1e-8, 1e-8, 1e-8, 1e-8, 1e-10},
            "R404A", new double[] {1e-8, 1e-8, 1e-8, 1e-8, 1e-10},
            "R407C", new double[] {1e-8, 1e-8, 1e-8, 1e-8, 1e-10},
            "R507A", new double[] {1e-8, 1e-8, 1e-8, 1e-8, 1e-10});

    @Test
    void statedAccuracyIsTheTestedOne() {
        for (String b : INDEX) {
            assertArrayEquals(STATED.get(b), BlendTransport.ACCURACY.get(b), b);
        }
        assertEquals(INDEX.size(), BlendTransport.ACCURACY.size(), "one stated accuracy per blend");
    }

    @Test
    void bubbleLiquidAndDewVapourMatchCoolProp() {
        List<double[]> rows = Reference.csv("/reference/fluid-transport-blend-saturation.csv");
        assertEquals(48, rows.size(), "4 blends x 12 temperatures");
        for (double[] r : rows) {
            String name = INDEX.get((int) r[0]);
            Fluid f = Fluids.byName(name);
            TransportProperties tp = f.transport();
            SaturationState s = f.saturationAtTemperature(r[1]);
            double[] tol = STATED.get(name);
            String at = name + " at " + r[1] + " K (CoolProp 8.0.0)";
            assertRelative(r[2], tp.viscosity(s.liquid()), tol[0], at + ": bubble-point liquid viscosity");
            assertRelative(r[3], tp.viscosity(s.vapour()), tol[1], at + ": dew-point vapour viscosity");
            assertRelative(r[4], tp.conductivity(s.liquid()), tol[2], at + ": bubble-point liquid conductivity");
            assertRelative(r[5], tp.conductivity(s.vapour()), tol[3], at + ": dew-point vapour conductivity");
            assertRelative(r[6], tp.surfaceTension(r[1]), tol[4], at + ": surface tension");
        }
    }

    @Test
    void singlePhaseStatesMatchCoolProp() {
        List<double[]> rows = Reference.csv("/reference/fluid-transport-blend-states.csv");
        assertEquals(32, rows.size(), "4 blends x 8 states");
        for (double[] r : rows) {
            String name = INDEX.get((int) r[0]);
            Fluid f = Fluids.byName(name);
            FluidState s = f.at(InputPair.TP, r[1], r[2]);
            double[] tol = STATED.get(name);
            boolean liquid = s.phase() == Phase.LIQUID;
            String at = name + " at " + r[1] + " K, " + r[2] + " Pa (CoolProp 8.0.0)";
            assertRelative(r[3], f.transport().viscosity(s), liquid ? tol[0] : tol[1], at + ": viscosity");
            assertRelative(r[4], f.transport().conductivity(s), liquid ? tol[2] : tol[3], at + ": conductivity");
        }
    }
}
