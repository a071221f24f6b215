package org.finstack.tubeside;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;

import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

class VoidFractionTest {

    private static final List<double[]> FLUIDS = Reference.csv("/reference/tubeside_fluids.csv");
    private static final SaturatedProperties EVAP = TubesideFixtures.evaporating();

    private static SaturatedProperties props(double[] r) {
        return TubesideFixtures.of(r[2], r[3], r[4], r[5], r[6]);
    }

    private static void checkKind(int kind, VoidFraction m) {
        int n = 0;
        for (double[] r : FLUIDS) {
            if (r[0] == kind) {
                Reference.assertRelative(r[15], m.voidFraction(props(r), TubeFlow.adiabatic(r[7], r[8], r[1]),
                        Warnings.discard()), 1e-9, m.id() + " x=" + r[1] + " G=" + r[8] + " (fluids)");
                n++;
            }
        }
        assertThat(n).isEqualTo(144);
    }

    @Test
    void ziviMatchesFluidsLibrary() {
        // tubeside_fluids.csv kind 5: fluids.two_phase_voidage.Zivi
        checkKind(5, Zivi1964.INSTANCE);
    }

    @Test
    void rouhaniAxelssonMatchesFluidsLibrary() {
        // tubeside_fluids.csv kind 6: fluids.two_phase_voidage.Rouhani_1 (C0 = 1 + 0.2 (1 - x))
        checkKind(6, RouhaniAxelsson1970.INSTANCE);
    }

    @Test
    void workedExamples() {
        // fluids docstrings: Zivi(.4, 800, 2.5) = 0.9689339909056356; Rouhani_1(0.4, 800., 2.5, sigma=0.02, m=1,
        // D=0.3) = 0.8588420244136714. Steiner: Javadoc value (same inputs, C0 slope 0.12)
        SaturatedProperties p = TubesideFixtures.of(800, 2.5, 1e-4, 1e-5, 0.02);
        double g = 1 / (Math.PI / 4 * 0.3 * 0.3);
        TubeFlow f = TubeFlow.adiabatic(0.3, g, 0.4);
        Reference.assertRelative(0.9689339909056356, Zivi1964.INSTANCE.voidFraction(p, f, new Warnings()), 1e-12,
                "Zivi fluids docstring");
        Reference.assertRelative(0.8588420244136714, RouhaniAxelsson1970.INSTANCE.voidFraction(p, f, new Warnings()),
                1e-12, "Rouhani_1 fluids docstring");
        Reference.assertRelative(0.895950, Steiner1993.INSTANCE.voidFraction(p, f, new Warnings()), 2e-6,
                "Steiner example");
    }

    @Test
    void voidFractionRisesWithQualityFromZeroToOne() {
        for (VoidFraction m : VoidFractions.all()) {
            for (double g : new double[] {50, 300, 800}) {
                assertThat(m.voidFraction(EVAP, TubeFlow.adiabatic(0.008, g, 0), Warnings.discard())).isZero();
                assertThat(m.voidFraction(EVAP, TubeFlow.adiabatic(0.008, g, 1), Warnings.discard())).isEqualTo(1.0);
                double last = 0;
                for (double x = 0.01; x < 1; x += 0.01) {
                    double a = m.voidFraction(EVAP, TubeFlow.adiabatic(0.008, g, x), Warnings.discard());
                    assertThat(a).as("%s at x=%s", m.id(), x).isGreaterThan(last).isLessThan(1);
                    last = a;
                }
            }
        }
    }

    @Test
    void steinerLiesAboveRouhaniAxelssonBelowHomogeneous() {
        // smaller distribution parameter (0.12 vs 0.2) means less slip correction: more void; homogeneous is the
        // no-slip upper bound for these drift-flux forms with positive drift
        for (double x = 0.05; x < 1; x += 0.05) {
            TubeFlow f = TubeFlow.adiabatic(0.008, 200, x);
            double ra = RouhaniAxelsson1970.INSTANCE.voidFraction(EVAP, f, Warnings.discard());
            double st = Steiner1993.INSTANCE.voidFraction(EVAP, f, Warnings.discard());
            double hom = x / EVAP.vapourDensity() / (x / EVAP.vapourDensity() + (1 - x) / EVAP.liquidDensity());
            assertThat(st).isGreaterThan(ra).isLessThan(hom);
        }
    }

    @Test
    void accelerationMatchesFluidsLibrary() {
        // tubeside_fluids.csv kind 7: fluids.two_phase.two_phase_dP_acceleration with fluids' Zivi void fractions
        int n = 0;
        for (double[] r : FLUIDS) {
            if (r[0] == 7) {
                double dp = AccelerationPressureChange.between(Zivi1964.INSTANCE, props(r), r[7], r[8], r[1], r[13],
                        Warnings.discard());
                Reference.assertRelative(r[15], dp, 1e-9, "acceleration x " + r[1] + " -> " + r[13] + " (fluids)");
                n++;
            }
        }
        assertThat(n).isEqualTo(144);
    }

    @Test
    void accelerationWorkedExampleAndSigns() {
        // fluids docstring: two_phase_dP_acceleration(m=1, D=0.1, xi=0.372, xo=0.557, rho_li=827.1, rho_gi=3.919,
        // alpha_i=0.992, alpha_o=0.996) = 706.8560377214725
        double g = 1 / (Math.PI / 4 * 0.1 * 0.1);
        Reference.assertRelative(706.8560377214725, AccelerationPressureChange.fromVoidFractions(g, 0.372, 0.992,
                0.557, 0.996, 827.1, 3.919), 1e-12, "fluids docstring example");
        for (VoidFraction m : VoidFractions.all()) {
            double up = AccelerationPressureChange.between(m, EVAP, 0.008, 200, 0.2, 0.8, Warnings.discard());
            double down = AccelerationPressureChange.between(m, EVAP, 0.008, 200, 0.8, 0.2, Warnings.discard());
            assertThat(up).isPositive();
            assertThat(down).isEqualTo(-up);
            // full evaporation: G^2 (1/rho_v - 1/rho_l), independent of the void model
            double full = AccelerationPressureChange.between(m, EVAP, 0.008, 200, 0, 1, Warnings.discard());
            Reference.assertRelative(200.0 * 200 * (1 / EVAP.vapourDensity() - 1 / EVAP.liquidDensity()), full, 1e-12,
                    m.id() + " x 0 -> 1");
        }
    }
}
