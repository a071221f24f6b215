package org.finstack.exchanger;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.junit.jupiter.api.Test;

/** Arrangement ids are part of the case-file format: they must stay as they are and read back. */
class ArrangementTest {

    @Test
    void fixedIdsAreStable() {
        assertEquals(List.of("counterflow", "parallel-flow", "crossflow-unmixed", "crossflow-unmixed-approx",
                "crossflow-cmax-mixed", "crossflow-cmin-mixed"),
                List.of(FlowArrangement.values()).stream().map(FlowArrangement::id).toList());
        assertEquals("counter-crossflow-3-rows-air-cmin", CounterCrossflow.rows(3, true).id());
        assertEquals("counter-crossflow-8-rows-air-cmax", CounterCrossflow.rows(8, false).id());
    }

    @Test
    void everyIdReadsBackToItsArrangement() {
        for (Arrangement a : EpsilonNtuProperties.allArrangements()) {
            assertEquals(a, Arrangement.of(a.id()), a.id());
            assertNotNull(a.source());
            assertFalse(a.description().isBlank());
        }
    }

    @Test
    void idsIgnoreCaseAndBlanksAndAcceptSingularRow() {
        assertEquals(FlowArrangement.COUNTERFLOW, Arrangement.of("  CounterFlow "));
        assertEquals(CounterCrossflow.rows(1, false), Arrangement.of("counter-crossflow-1-row-air-cmax"));
    }

    @Test
    void unknownOrMissingIdIsRejectedNamingTheField() {
        InputException e = assertThrows(InputException.class, () -> Arrangement.of("shell-and-tube"));
        assertEquals("arrangement", e.field());
        assertEquals(Msg.UNKNOWN_NAME, e.msg());
        assertTrue(e.getMessage().contains("counter-crossflow-<n>-rows-air-cmin"), e.getMessage());
        assertEquals("arrangement", assertThrows(InputException.class, () -> Arrangement.of(null)).field());
        assertEquals("arrangement", assertThrows(InputException.class, () -> Arrangement.of(" ")).field());
    }

    @Test
    void zeroRowsIsRejected() {
        assertEquals("rows", assertThrows(InputException.class, () -> CounterCrossflow.rows(0, true)).field());
        assertEquals("rows", assertThrows(InputException.class,
                () -> Arrangement.of("counter-crossflow-0-rows-air-cmin")).field());
    }

    @Test
    void cminSideFollowsTheCapacityRates() {
        assertTrue(CounterCrossflow.rows(4, 1200.0, 3000.0).airIsCmin());
        assertFalse(CounterCrossflow.rows(4, 1200.0, 800.0).airIsCmin());
        assertEquals("airCapacityRate", assertThrows(InputException.class,
                () -> CounterCrossflow.rows(4, 0.0, 800.0)).field());
    }

    @Test
    void onlyOneToFourRowsAreExact() {
        assertTrue(CounterCrossflow.rows(4, true).exact());
        assertFalse(CounterCrossflow.rows(5, true).exact());
        assertEquals(CounterCrossflow.SOURCE, CounterCrossflow.rows(2, true).source());
        assertEquals(CounterCrossflow.COUNTERFLOW_LIMIT_SOURCE, CounterCrossflow.rows(6, true).source());
    }
}
