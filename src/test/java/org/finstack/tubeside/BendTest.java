package org.finstack.tubeside;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;

import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

class BendTest {

    private static final SaturatedProperties EVAP = TubesideFixtures.evaporating();

    @Test
    void rennelsMatchesFluidsLibrary() {
        // tubeside_fluids.csv kind 8: fluids.fittings.bend_rounded(method='Rennels') with fd given (column eD)
        int n = 0;
        for (double[] r : Reference.csv("/reference/tubeside_fluids.csv")) {
            if (r[0] == 8) {
                Reference.assertRelative(r[15], Rennels2012Bend.lossCoefficient(r[10], r[11], r[12],
                        Warnings.discard()), 1e-9, "Rennels fd=" + r[10] + " angle=" + r[11] + " r/d=" + r[12]);
                n++;
            }
        }
        assertThat(n).isEqualTo(24);
        // Javadoc example
        Reference.assertRelative(0.294396, Rennels2012Bend.lossCoefficient(0.02, 180, 1.5, new Warnings()), 2e-6,
                "Rennels example");
    }

    @Test
    void chisholmMatchesIndependentEvaluation() {
        // tubeside_equations.csv kind 8: plain-Python evaluation of the printed equations
        int n = 0;
        List<double[]> rows = Reference.csv("/reference/tubeside_equations.csv");
        for (double[] r : rows) {
            if (r[0] == 8) {
                TubeFlow f = TubeFlow.adiabatic(r[4], r[1], r[2]);
                Reference.assertRelative(r[6], Chisholm1983Bend.pressureDrop(EVAP, f, 1.5 * r[4], 180,
                        Warnings.discard()), 1e-9, "Chisholm bend G=" + r[1] + " x=" + r[2] + " D=" + r[4]);
                n++;
            }
        }
        assertThat(n).isEqualTo(36);
        Reference.assertRelative(442.612, Chisholm1983Bend.pressureDrop(EVAP, TubeFlow.adiabatic(0.008, 200, 0.5),
                0.012, 180, new Warnings()), 2e-6, "Chisholm example");
    }

    @Test
    void chisholmEndsAndTrend() {
        // x = 0: single-phase liquid loss K G^2 / (2 rho_l); x = 1: multiplier rho_l/rho_v (vapour-only loss with K_lo)
        double g = 200;
        double relo = g * 0.008 / EVAP.liquidViscosity();
        double k = Rennels2012Bend.lossCoefficient(Churchill1977.SMOOTH.darcy(relo), 180, 1.5, Warnings.discard());
        Reference.assertRelative(k * g * g / (2 * EVAP.liquidDensity()), Chisholm1983Bend.pressureDrop(EVAP,
                TubeFlow.adiabatic(0.008, g, 0), 0.012, 180, Warnings.discard()), 1e-12, "x = 0");
        Reference.assertRelative(EVAP.liquidDensity() / EVAP.vapourDensity(),
                Chisholm1983Bend.multiplier(EVAP, 1, k, 1.5), 1e-12, "x = 1 multiplier");
        // the multiplier rises with x up to x = B / (2 (B - 1)), never below 0.5 (for B > 2 it peaks before x = 1)
        double last = 0;
        for (double x = 0; x <= 0.5; x += 0.05) {
            double dp = Chisholm1983Bend.pressureDrop(EVAP, TubeFlow.adiabatic(0.008, g, x), 0.012, 180,
                    Warnings.discard());
            assertThat(dp).isGreaterThan(last);
            last = dp;
        }
    }

    @Test
    void tightBendWarnsBelowPublishedRange() {
        // Rennels & Hudson 2012: r/d from 0.5 upward (was r/d >= 1, a value from memory)
        Warnings w = new Warnings();
        Rennels2012Bend.lossCoefficient(0.02, 180, 0.4, w);
        assertThat(w.list()).anyMatch(s -> s.contains("r/d") && s.contains("published range"));
        Warnings c = new Warnings();
        Chisholm1983Bend.pressureDrop(EVAP, TubeFlow.adiabatic(0.008, 200, 0.5), 0.0032, 180, c);
        assertThat(c.list()).anyMatch(s -> s.contains("r/d"));
    }

    @Test
    void noWarningInsidePublishedRange() {
        for (double rd : new double[] {0.5, 0.6, 1.5, 25}) {
            Warnings w = new Warnings();
            Rennels2012Bend.lossCoefficient(0.02, 180, rd, w);
            assertThat(w.list()).as("r/d = " + rd).noneMatch(s -> s.contains("r/d"));
        }
    }
}
