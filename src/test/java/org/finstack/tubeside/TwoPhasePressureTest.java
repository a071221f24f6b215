package org.finstack.tubeside;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;

import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

class TwoPhasePressureTest {

    private static final List<double[]> FLUIDS = Reference.csv("/reference/tubeside_fluids.csv");
    private static final SaturatedProperties EVAP = TubesideFixtures.evaporating();

    /**
     * The friction law of fluids 1.0.22's friction_factor: 64/Re below its LAMINAR_TRANSITION_PIPE = 2040,
     * the Colebrook solution (Clamond) above (read from the library's source).
     */
    private static final DarcyFriction FLUIDS_LAW = re -> re < 2040 ? 64 / re
            : Colebrook1939.darcy(re, 0, Warnings.discard());

    private static SaturatedProperties props(double[] r) {
        return TubesideFixtures.of(r[2], r[3], r[4], r[5], r[6]);
    }

    @Test
    void friedelMatchesFluidsLibrary() {
        // tubeside_fluids.csv kind 3: fluids.two_phase.Friedel (Froude exponent 0.0454 there, 0.045 here:
        // the tolerance per row is the largest effect of that difference, |Fr^0.0004 - 1|)
        TwoPhaseFriction friedel = Friedel1979.withFriction(FLUIDS_LAW);
        int n = 0;
        for (double[] r : FLUIDS) {
            if (r[0] == 3) {
                double tol = Math.abs(Math.pow(r[14], 0.0004) - 1) + 1e-9;
                Reference.assertRelative(r[15], friedel.gradient(props(r), TubeFlow.adiabatic(r[7], r[8], r[1]),
                        Warnings.discard()), tol, "Friedel x=" + r[1] + " G=" + r[8] + " D=" + r[7] + " (fluids)");
                n++;
            }
        }
        assertThat(n).isEqualTo(216);
    }

    @Test
    void mullerSteinhagenHeckMatchesFluidsLibrary() {
        // tubeside_fluids.csv kind 4: fluids.two_phase.Muller_Steinhagen_Heck
        TwoPhaseFriction msh = MullerSteinhagenHeck1986.withFriction(FLUIDS_LAW);
        int n = 0;
        for (double[] r : FLUIDS) {
            if (r[0] == 4) {
                Reference.assertRelative(r[15], msh.gradient(props(r), TubeFlow.adiabatic(r[7], r[8], r[1]),
                        Warnings.discard()), 1e-9, "MSH x=" + r[1] + " G=" + r[8] + " D=" + r[7] + " (fluids)");
                n++;
            }
        }
        assertThat(n).isEqualTo(216);
    }

    @Test
    void workedExamples() {
        // Javadoc worked examples (fixture R134a near 5 C, D = 8 mm, G = 200, x = 0.5, Churchill smooth)
        TubeFlow f = TubeFlow.adiabatic(0.008, 200, 0.5);
        Reference.assertRelative(2429.03, Friedel1979.INSTANCE.gradient(EVAP, f, new Warnings()), 5e-6,
                "Friedel example");
        Reference.assertRelative(2220.99, MullerSteinhagenHeck1986.INSTANCE.gradient(EVAP, f, new Warnings()), 5e-6,
                "Müller-Steinhagen & Heck example");
    }

    @Test
    void endsAreTheSinglePhaseGradients() {
        for (TwoPhaseFriction m : TwoPhaseFrictions.all()) {
            for (double g : new double[] {50, 300, 800}) {
                double lo = TwoPhaseFriction.singlePhaseGradient(m.friction(), g, 0.008, EVAP.liquidDensity(),
                        EVAP.liquidViscosity());
                double vo = TwoPhaseFriction.singlePhaseGradient(m.friction(), g, 0.008, EVAP.vapourDensity(),
                        EVAP.vapourViscosity());
                Reference.assertRelative(lo, m.gradient(EVAP, TubeFlow.adiabatic(0.008, g, 0), Warnings.discard()),
                        1e-12, m.id() + " x = 0 is liquid-only");
                Reference.assertRelative(vo, m.gradient(EVAP, TubeFlow.adiabatic(0.008, g, 1), Warnings.discard()),
                        1e-12, m.id() + " x = 1 is vapour-only");
            }
        }
    }

    @Test
    void gradientRisesWithMassFluxAndExceedsLiquidOnly() {
        for (TwoPhaseFriction m : TwoPhaseFrictions.all()) {
            for (double x : new double[] {0.1, 0.4, 0.7, 0.95}) {
                double last = 0;
                for (double g = 50; g <= 1000; g += 50) {
                    double dp = m.gradient(EVAP, TubeFlow.adiabatic(0.008, g, x), Warnings.discard());
                    assertThat(dp).as("%s rises with G at x=%s G=%s", m.id(), x, g).isGreaterThan(last);
                    double lo = TwoPhaseFriction.singlePhaseGradient(m.friction(), g, 0.008, EVAP.liquidDensity(),
                            EVAP.liquidViscosity());
                    assertThat(dp).isGreaterThan(lo);
                    last = dp;
                }
            }
        }
    }

    @Test
    void friedelRejectsVapourMoreViscousThanLiquidAndWarnsOnViscosityRatio() {
        assertThatThrownBy(() -> Friedel1979.INSTANCE.gradient(TubesideFixtures.of(1000, 10, 1e-5, 2e-5, 0.01),
                TubeFlow.adiabatic(0.008, 200, 0.5), Warnings.discard())).isInstanceOf(InputException.class)
                .hasMessageStartingWith("vapourViscosity:");
        Warnings w = new Warnings();
        Friedel1979.INSTANCE.gradient(TubesideFixtures.of(1000, 10, 2e-2, 1e-5, 0.01),
                TubeFlow.adiabatic(0.008, 200, 0.5), w);
        assertThat(w.list()).anyMatch(s -> s.contains("mu_l/mu_v"));
    }
}
