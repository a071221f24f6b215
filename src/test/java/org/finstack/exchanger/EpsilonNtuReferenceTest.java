package org.finstack.exchanger;

import static org.finstack.testing.Reference.assertRelative;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.List;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/**
 * Checks against reference data generated with scipy by scripts/gen_entu_reference.py (see the
 * '#' headers of the CSV files for source, units and tolerance).
 */
class EpsilonNtuReferenceTest {

    @Test
    void crossflowUnmixedSeriesMatchesScipyGammaincUpToNtu30() {
        List<double[]> rows = Reference.csv("/reference/entu_crossflow_unmixed.csv");
        assertFalse(rows.isEmpty());
        for (double[] r : rows) {
            // tolerance 1e-11: header of entu_crossflow_unmixed.csv
            assertRelative(r[2], EpsilonNtu.effectiveness(FlowArrangement.CROSSFLOW_BOTH_UNMIXED, r[0], r[1]),
                    1e-11, "Mason series at NTU " + r[0] + ", Cr " + r[1] + " (scipy.special.gammainc)");
        }
    }

    @Test
    void counterCrossflowMatchesScipySolveIvpForOneToFourRows() {
        List<double[]> rows = Reference.csv("/reference/entu_counter_crossflow.csv");
        int checked = 0;
        for (double[] r : rows) {
            int n = (int) r[0];
            if (n > CounterCrossflow.MAX_EXACT_ROWS) {
                continue;
            }
            CounterCrossflow a = CounterCrossflow.rows(n, r[1] == 1);
            // tolerance 1e-8: header of entu_counter_crossflow.csv
            assertRelative(r[4], EpsilonNtu.effectiveness(a, r[2], r[3]), 1e-8,
                    a.id() + " at NTU " + r[2] + ", Cr " + r[3] + " (scipy.integrate.solve_ivp)");
            checked++;
        }
        org.junit.jupiter.api.Assertions.assertEquals(160, checked);
    }

    @Test
    void countercrossflowBeyondFourRowsOverstatesByLessThanTheFourRowGap() {
        List<double[]> rows = Reference.csv("/reference/entu_counter_crossflow.csv");
        for (double[] r : rows) {
            int n = (int) r[0];
            if (n <= CounterCrossflow.MAX_EXACT_ROWS) {
                continue;
            }
            boolean air = r[1] == 1;
            double used = EpsilonNtu.effectiveness(CounterCrossflow.rows(n, air), r[2], r[3]);
            double four = EpsilonNtu.effectiveness(CounterCrossflow.rows(4, air), r[2], r[3]);
            String at = n + " rows, air Cmin " + air + ", NTU " + r[2] + ", Cr " + r[3];
            org.junit.jupiter.api.Assertions.assertTrue(used >= r[4] - 1e-9,
                    "counterflow limit is an upper bound: " + at);
            org.junit.jupiter.api.Assertions.assertTrue(used - r[4] <= used - four + 1e-9,
                    "error of the limit below the 4-row gap: " + at);
        }
    }
}
