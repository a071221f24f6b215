package org.finstack.exchanger;

import static org.finstack.testing.Reference.assertRelative;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.finstack.core.InputException;
import org.junit.jupiter.api.Test;

/** LMTD and the F factor. */
class LmtdTest {

    /** The worked example of the Lmtd Javadoc: (30 - 10) / ln(30 / 10) = 18.2048 K. */
    @Test
    void lmtdWorkedExample() {
        assertEquals(18.2048, Lmtd.lmtd(30, 10), 5e-5);
        assertEquals(18.2048, Lmtd.lmtd(10, 30), 5e-5);
    }

    @Test
    void lmtdOfEqualDifferencesIsThatDifference() {
        assertEquals(12.5, Lmtd.lmtd(12.5, 12.5), 0);
        // approaching the limit smoothly: LMTD of d and d(1 + x) tends to d(1 + x/2)
        assertEquals(12.5 * (1 + 0.5e-9), Lmtd.lmtd(12.5, 12.5 * (1 + 1e-9)), 1e-12);
        assertEquals(-4.0, Lmtd.lmtd(-4, -4), 0);
    }

    @Test
    void lmtdLiesBetweenGeometricAndArithmeticMeans() {
        // a classical inequality for the logarithmic mean: sqrt(ab) <= L(a, b) <= (a + b) / 2
        double l = Lmtd.lmtd(3, 40);
        org.junit.jupiter.api.Assertions.assertTrue(Math.sqrt(120) < l && l < 21.5, "LMTD " + l);
    }

    @Test
    void lmtdRejectsDifferencesOfOppositeSign() {
        assertEquals("dT2", assertThrows(InputException.class, () -> Lmtd.lmtd(5, -2)).field());
        assertEquals("dT2", assertThrows(InputException.class, () -> Lmtd.lmtd(-5, 2)).field());
        assertEquals("dT1", assertThrows(InputException.class, () -> Lmtd.lmtd(Double.NaN, 2)).field());
        assertEquals(0.0, Lmtd.lmtd(0, 7));
    }

    @Test
    void counterflowCorrectionIsOne() {
        assertEquals(1.0, Lmtd.correctionFactor(FlowArrangement.COUNTERFLOW, 0.6, 0.8));
        assertEquals(1.0, Lmtd.correctionFactor(FlowArrangement.CROSSFLOW_BOTH_UNMIXED, 0, 0.8));
        assertEquals(1.0, Lmtd.correctionFactor(FlowArrangement.CROSSFLOW_BOTH_UNMIXED, 0.6, 0));
    }

    /**
     * Parallel flow has its own log-mean: q = U A LMTD(parallel ends), so F must equal
     * LMTD(parallel ends) / LMTD(counterflow ends) for the same terminal temperatures.
     */
    @Test
    void parallelFlowCorrectionEqualsRatioOfItsOwnLogMean() {
        double thIn = 80;
        double tcIn = 20;
        double[][] pr = {{0.3, 0.5}, {0.5, 0.9}, {0.2, 2.0}, {0.45, 1.0}};
        for (double[] c : pr) {
            double p = c[0];
            double r = c[1];
            double thOut = thIn - p * (thIn - tcIn);        // fluid 1 = hot
            double tcOut = tcIn + r * (thIn - thOut);       // R = C_hot / C_cold = cold change / hot change
            double parallel = Lmtd.lmtd(thIn - tcIn, thOut - tcOut);
            double counter = Lmtd.lmtd(thIn - tcOut, thOut - tcIn);
            assertRelative(parallel / counter, Lmtd.correctionFactor(FlowArrangement.PARALLEL_FLOW, p, r), 1e-12,
                    "parallel-flow F at P " + p + ", R " + r);
        }
    }

    @Test
    void unreachablePAndBadRAreRejected() {
        // parallel flow: P below 1 / (1 + R) = 0.5 at R = 1
        assertEquals("P", assertThrows(InputException.class,
                () -> Lmtd.correctionFactor(FlowArrangement.PARALLEL_FLOW, 0.5, 1)).field());
        // fluid 1 the Cmax fluid, R = 2: Cr = 0.5, eps < 1 / (1 + 0.5) = 2/3, so P = eps / R < 1/3
        assertEquals("P", assertThrows(InputException.class,
                () -> Lmtd.correctionFactor(FlowArrangement.PARALLEL_FLOW, 0.34, 2)).field());
        assertEquals("R", assertThrows(InputException.class,
                () -> Lmtd.correctionFactor(FlowArrangement.PARALLEL_FLOW, 0.2, -1)).field());
        assertEquals("P", assertThrows(InputException.class,
                () -> Lmtd.correctionFactor(FlowArrangement.COUNTERFLOW, 1.0, 0.5)).field());
        assertEquals("arrangement", assertThrows(InputException.class,
                () -> Lmtd.correctionFactor(null, 0.2, 0.5)).field());
    }
}
