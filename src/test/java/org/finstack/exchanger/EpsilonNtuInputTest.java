package org.finstack.exchanger;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Invariant of the input contract: bad inputs are rejected with the field and the reason, never answered with NaN. */
class EpsilonNtuInputTest {

    private static InputException rejects(String field, Executable call) {
        InputException e = assertThrows(InputException.class, call);
        assertEquals(field, e.field(), e.getMessage());
        return e;
    }

    @Test
    void negativeOrNonFiniteNtuIsRejected() {
        rejects("ntu", () -> EpsilonNtu.effectiveness(FlowArrangement.COUNTERFLOW, -0.1, 0.5));
        rejects("ntu", () -> EpsilonNtu.effectiveness(FlowArrangement.COUNTERFLOW, Double.NaN, 0.5));
        rejects("ntu", () -> EpsilonNtu.effectiveness(FlowArrangement.COUNTERFLOW, Double.POSITIVE_INFINITY, 0.5));
    }

    @Test
    void crOutsideZeroToOneIsRejected() {
        rejects("cr", () -> EpsilonNtu.effectiveness(FlowArrangement.PARALLEL_FLOW, 1, 1.01));
        rejects("cr", () -> EpsilonNtu.effectiveness(FlowArrangement.PARALLEL_FLOW, 1, -0.01));
        rejects("cr", () -> EpsilonNtu.ntu(FlowArrangement.PARALLEL_FLOW, 0.3, Double.NaN));
    }

    @Test
    void missingArrangementIsRejected() {
        rejects("arrangement", () -> EpsilonNtu.effectiveness(null, 1, 0.5));
        rejects("arrangement", () -> EpsilonNtu.ntu(null, 0.5, 0.5));
    }

    @Test
    void parallelFlowCannotReachOneOverOnePlusCr() {
        // 1 / (1 + Cr) = 0.625 at Cr = 0.6 (Kays & London 1984)
        InputException e = rejects("effectiveness", () -> EpsilonNtu.ntu(FlowArrangement.PARALLEL_FLOW, 0.625, 0.6));
        assertEquals(Msg.NOT_BELOW, e.msg());
        rejects("effectiveness", () -> EpsilonNtu.ntu(FlowArrangement.PARALLEL_FLOW, 0.7, 0.6));
    }

    @Test
    void unreachableEffectivenessIsRejectedForEveryArrangement() {
        for (Arrangement a : EpsilonNtuProperties.allArrangements()) {
            rejects("effectiveness", () -> EpsilonNtu.ntu(a, 1.0, 0.5));
            double max = EpsilonNtu.maxEffectiveness(a, 0.8);
            if (max < 1) {
                rejects("effectiveness", () -> EpsilonNtu.ntu(a, max, 0.8));
            }
        }
        rejects("effectiveness", () -> EpsilonNtu.ntu(FlowArrangement.COUNTERFLOW, 1.2, 0.5));
        rejects("effectiveness", () -> EpsilonNtu.ntu(FlowArrangement.COUNTERFLOW, -0.1, 0.5));
    }

    @Test
    void oneFluidMixedLimitsMatchTheirClosedForms() {
        // NTU -> infinity in Kays & London's relations: (1 - e^-Cr)/Cr and 1 - e^(-1/Cr)
        assertEquals((1 - Math.exp(-0.5)) / 0.5, EpsilonNtu.maxEffectiveness(FlowArrangement.CROSSFLOW_CMAX_MIXED, 0.5),
                1e-15);
        assertEquals(1 - Math.exp(-2), EpsilonNtu.maxEffectiveness(FlowArrangement.CROSSFLOW_CMIN_MIXED, 0.5), 1e-15);
        assertEquals(EpsilonNtu.effectiveness(CounterCrossflow.rows(3, true), 700, 0.5),
                EpsilonNtu.maxEffectiveness(CounterCrossflow.rows(3, true), 0.5), 1e-12);
    }

    @Test
    void zeroNtuAndZeroEffectivenessAreEachOthersInverse() {
        for (Arrangement a : EpsilonNtuProperties.allArrangements()) {
            assertEquals(0.0, EpsilonNtu.effectiveness(a, 0, 0.7), a.id());
            assertEquals(0.0, EpsilonNtu.ntu(a, 0, 0.7), a.id());
        }
    }

    @Test
    void exactCrossflowSeriesConvergesFarBeyondNtu20() {
        double eps1000 = EpsilonNtu.effectiveness(FlowArrangement.CROSSFLOW_BOTH_UNMIXED, 1000, 1);
        double eps2000 = EpsilonNtu.effectiveness(FlowArrangement.CROSSFLOW_BOTH_UNMIXED, 2000, 1);
        org.junit.jupiter.api.Assertions.assertTrue(eps1000 < eps2000 && eps2000 < 1, eps1000 + " " + eps2000);
        // tiny NTU keeps full relative precision: eps = NTU to first order, the next term being 1e-18
        assertEquals(1e-9, EpsilonNtu.effectiveness(FlowArrangement.CROSSFLOW_BOTH_UNMIXED, 1e-9, 0.5), 1e-17);
    }
}
