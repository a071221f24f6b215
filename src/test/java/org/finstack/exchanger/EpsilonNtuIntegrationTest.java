package org.finstack.exchanger;

import static org.finstack.testing.Reference.assertRelative;

import org.junit.jupiter.api.Test;

/**
 * Checks the relations against independent numerical integrations of the exchangers' energy
 * balances ({@link NumericalExchanger}, written in this test package).
 */
class EpsilonNtuIntegrationTest {

    private static final double[] NTUS = {0.3, 1, 2.5, 5};
    private static final double[] CRS = {0.2, 0.6, 1};

    @Test
    void counterflowAndParallelMatchRungeKutta() {
        for (double ntu : NTUS) {
            for (double cr : CRS) {
                String at = " at NTU " + ntu + ", Cr " + cr + " (Runge-Kutta, 4000 steps)";
                assertRelative(NumericalExchanger.twoStream(true, ntu, cr, 4000),
                        EpsilonNtu.effectiveness(FlowArrangement.COUNTERFLOW, ntu, cr), 1e-10,
                        "counterflow" + at);
                assertRelative(NumericalExchanger.twoStream(false, ntu, cr, 4000),
                        EpsilonNtu.effectiveness(FlowArrangement.PARALLEL_FLOW, ntu, cr), 1e-10,
                        "parallel flow" + at);
            }
        }
    }

    @Test
    void crossflowBothUnmixedMatchesCellGrid() {
        for (double ntu : NTUS) {
            for (double cr : CRS) {
                assertRelative(NumericalExchanger.crossflowGridExtrapolated(ntu, cr, 150, false, false),
                        EpsilonNtu.effectiveness(FlowArrangement.CROSSFLOW_BOTH_UNMIXED, ntu, cr), 2e-6,
                        "crossflow unmixed at NTU " + ntu + ", Cr " + cr + " (cell grid 150/300, Richardson)");
            }
        }
    }

    @Test
    void crossflowOneFluidMixedMatchesCellGrid() {
        for (double ntu : NTUS) {
            for (double cr : CRS) {
                String at = " at NTU " + ntu + ", Cr " + cr + " (cell grid 150/300, Richardson)";
                assertRelative(NumericalExchanger.crossflowGridExtrapolated(ntu, cr, 150, false, true),
                        EpsilonNtu.effectiveness(FlowArrangement.CROSSFLOW_CMAX_MIXED, ntu, cr), 2e-6,
                        "crossflow Cmax mixed" + at);
                assertRelative(NumericalExchanger.crossflowGridExtrapolated(ntu, cr, 150, true, false),
                        EpsilonNtu.effectiveness(FlowArrangement.CROSSFLOW_CMIN_MIXED, ntu, cr), 2e-6,
                        "crossflow Cmin mixed" + at);
            }
        }
    }

    @Test
    void counterCrossflowOneToFourRowsMatchesRowMarch() {
        for (int rows = 1; rows <= 4; rows++) {
            for (boolean airIsCmin : new boolean[] {true, false}) {
                for (double ntu : NTUS) {
                    for (double cr : CRS) {
                        assertRelative(
                                NumericalExchanger.counterCrossflowExtrapolated(rows, ntu, cr, airIsCmin, 400),
                                EpsilonNtu.effectiveness(CounterCrossflow.rows(rows, airIsCmin), ntu, cr), 1e-7,
                                rows + " rows, air Cmin " + airIsCmin + ", NTU " + ntu + ", Cr " + cr
                                        + " (row march 400/800, Richardson)");
                    }
                }
            }
        }
    }

    @Test
    void fiveAndSixRowsLieBetweenFourRowFormAndCounterflow() {
        for (boolean airIsCmin : new boolean[] {true, false}) {
            for (double ntu : NTUS) {
                for (double cr : CRS) {
                    double four = EpsilonNtu.effectiveness(CounterCrossflow.rows(4, airIsCmin), ntu, cr);
                    double counter = EpsilonNtu.effectiveness(FlowArrangement.COUNTERFLOW, ntu, cr);
                    double five = NumericalExchanger.counterCrossflowExtrapolated(5, ntu, cr, airIsCmin, 400);
                    double six = NumericalExchanger.counterCrossflowExtrapolated(6, ntu, cr, airIsCmin, 400);
                    String at = " at NTU " + ntu + ", Cr " + cr + ", air Cmin " + airIsCmin;
                    org.junit.jupiter.api.Assertions.assertTrue(four <= five + 1e-9 && five <= six + 1e-9
                            && six <= counter + 1e-9, "rows 4 <= 5 <= 6 <= counterflow" + at
                            + ": " + four + ", " + five + ", " + six + ", " + counter);
                }
            }
        }
    }
}
