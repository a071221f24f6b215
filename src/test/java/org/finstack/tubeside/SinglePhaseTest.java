package org.finstack.tubeside;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;

import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

class SinglePhaseTest {

    private static final List<double[]> FLUIDS = Reference.csv("/reference/tubeside_fluids.csv");
    private static final List<double[]> EQUATIONS = Reference.csv("/reference/tubeside_equations.csv");

    @Test
    void churchillMatchesFluidsLibrary() {
        // tubeside_fluids.csv kind 1: fluids.friction.Churchill_1977 (python3-fluids 1.0.22)
        int n = 0;
        for (double[] r : FLUIDS) {
            if (r[0] == 1) {
                Reference.assertRelative(r[15], Churchill1977.darcy(r[9], r[10], Warnings.discard()), 1e-9,
                        "Churchill 1977, Re=" + r[9] + " e/D=" + r[10] + " (fluids)");
                n++;
            }
        }
        assertThat(n).isEqualTo(36);
    }

    @Test
    void colebrookMatchesFluidsLibrary() {
        // tubeside_fluids.csv kind 2: fluids.friction.Colebrook, exact Lambert-W solution
        int n = 0;
        for (double[] r : FLUIDS) {
            if (r[0] == 2) {
                Reference.assertRelative(r[15], Colebrook1939.darcy(r[9], r[10], Warnings.discard()), 1e-9,
                        "Colebrook 1939, Re=" + r[9] + " e/D=" + r[10] + " (fluids)");
                n++;
            }
        }
        assertThat(n).isEqualTo(20);
    }

    @Test
    void frictionWorkedExamples() {
        // Javadoc examples; the same values are printed in the fluids docstrings of Churchill_1977 and Clamond
        Reference.assertRelative(0.0184626, Churchill1977.darcy(1e5, 1e-4, new Warnings()), 1e-5, "Churchill example");
        Reference.assertRelative(0.0185139, Colebrook1939.darcy(1e5, 1e-4, new Warnings()), 1e-5, "Colebrook example");
    }

    @Test
    void churchillIsLaminarAtLowReynoldsNumber() {
        // Hagen-Poiseuille f = 64/Re (textbook result)
        for (double re : new double[] {10, 100, 1000}) {
            Reference.assertRelative(64 / re, Churchill1977.darcy(re, 0, Warnings.discard()), 1e-6, "64/Re at " + re);
        }
    }

    @Test
    void colebrookWarnsInLaminarFlowAndFrictionFallsWithReynolds() {
        Warnings w = new Warnings();
        Colebrook1939.darcy(1000, 0, w);
        assertThat(w.list()).anyMatch(s -> s.contains("Colebrook 1939") && s.contains("Re"));
        double last = Double.MAX_VALUE;
        for (double re = 4000; re < 1e8; re *= 1.5) {
            double f = Colebrook1939.SMOOTH.darcy(re);
            assertThat(f).isLessThan(last);
            last = f;
        }
    }

    @Test
    void gnielinskiMatchesIndependentEvaluation() {
        // tubeside_equations.csv kind 1: scripts/gen_tubeside_equations.py, printed equations (no published table)
        int n = 0;
        for (double[] r : EQUATIONS) {
            if (r[0] == 1) {
                Gnielinski1976.Wall wall = r[3] == 1 ? Gnielinski1976.Wall.UNIFORM_HEAT_FLUX
                        : Gnielinski1976.Wall.UNIFORM_TEMPERATURE;
                Reference.assertRelative(r[6], Gnielinski1976.nusselt(r[1], r[2], wall, Warnings.discard()), 1e-9,
                        "Gnielinski Re=" + r[1] + " Pr=" + r[2] + " (gen_tubeside_equations.py)");
                n++;
            }
        }
        assertThat(n).isEqualTo(48);
    }

    @Test
    void gnielinskiWorkedExamples() {
        // Javadoc examples
        Reference.assertRelative(112.676, Gnielinski1976.nusselt(5e4, 0.8, Gnielinski1976.Wall.UNIFORM_TEMPERATURE,
                new Warnings()), 1e-5, "Gnielinski example Re=5e4");
        Reference.assertRelative(22.8346, Gnielinski1976.nusselt(5000, 3, Gnielinski1976.Wall.UNIFORM_HEAT_FLUX,
                new Warnings()), 1e-5, "Gnielinski example Re=5000");
    }

    @Test
    void gnielinskiIsContinuousThroughTheTransitionAndRisesWithReynolds() {
        for (Gnielinski1976.Wall wall : Gnielinski1976.Wall.values()) {
            for (double pr : new double[] {0.7, 3, 20}) {
                double below = Gnielinski1976.nusselt(2300 * (1 - 1e-9), pr, wall, Warnings.discard());
                double above = Gnielinski1976.nusselt(2300 * (1 + 1e-9), pr, wall, Warnings.discard());
                assertThat(above - below).isLessThan(1e-6);
                assertThat(below).isEqualTo(wall.laminarNusselt());
                below = Gnielinski1976.nusselt(1e4 * (1 - 1e-12), pr, wall, Warnings.discard());
                above = Gnielinski1976.nusselt(1e4 * (1 + 1e-12), pr, wall, Warnings.discard());
                Reference.assertRelative(above, below, 1e-9, "continuity at Re = 1e4");
                double last = 0;
                for (double re = 2400; re < 5e6; re *= 1.3) {
                    double nu = Gnielinski1976.nusselt(re, pr, wall, Warnings.discard());
                    assertThat(nu).isGreaterThan(last);
                    last = nu;
                }
            }
        }
    }

    @Test
    void gnielinskiWarnsOutsidePrandtlRange() {
        Warnings w = new Warnings();
        Gnielinski1976.nusselt(1e5, 0.1, Gnielinski1976.Wall.UNIFORM_HEAT_FLUX, w);
        assertThat(w.list()).anyMatch(s -> s.contains("Pr"));
        double nu = Gnielinski1976.nusselt(1e5, 1, Gnielinski1976.Wall.UNIFORM_HEAT_FLUX, Warnings.discard());
        Reference.assertRelative(10 * nu, Gnielinski1976.heatTransferCoefficient(1e5, 1, 0.1, 0.01,
                Gnielinski1976.Wall.UNIFORM_HEAT_FLUX, Warnings.discard()), 1e-14, "h = Nu k / D");
    }
}
