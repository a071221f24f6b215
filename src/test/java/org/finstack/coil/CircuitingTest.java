package org.finstack.coil;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.finstack.core.InputException;
import org.junit.jupiter.api.Test;

/**
 * Invariants of circuiting: every tube used exactly once, circuits of near-equal length, and the
 * standard pattern entering at the air-leaving row (counter-crossflow, common practice).
 */
class CircuitingTest {

    @Test
    void standardCircuitingUsesEveryTubeOnceAndEntersAtTheLeavingRow() {
        for (int rows = 1; rows <= 6; rows++) {
            for (int perRow = 1; perRow <= 24; perRow += 5) {
                for (int n = 1; n <= rows * perRow; n += Math.max(1, rows * perRow / 7)) {
                    Circuiting c = Circuiting.standard(rows, perRow, n);
                    assertThat(c.count()).isEqualTo(n);
                    int total = c.circuits().stream().mapToInt(List::size).sum();
                    assertThat(total).isEqualTo(rows * perRow);
                    int min = c.circuits().stream().mapToInt(List::size).min().orElseThrow();
                    int max = c.circuits().stream().mapToInt(List::size).max().orElseThrow();
                    assertThat(max - min).as("%d rows x %d, %d circuits", rows, perRow, n).isLessThanOrEqualTo(rows + 1);
                }
            }
        }
        Circuiting c = Circuiting.standard(3, 16, 4);
        for (List<Circuiting.Tube> circuit : c.circuits()) {
            assertThat(circuit.get(0).row()).isEqualTo(2);
            assertThat(circuit.get(circuit.size() - 1).row()).isEqualTo(0);
            assertThat(circuit).hasSize(12);
        }
    }

    @Test
    void labelsRoundTrip() {
        Circuiting c = Circuiting.standard(2, 4, 2);
        assertThat(c.labels().get(0)).containsExactly("2-1", "2-2", "1-2", "1-1");
        assertThat(Circuiting.parse(2, 4, c.labels())).isEqualTo(c);
    }

    @Test
    void missingDoubleAndForeignTubesAreRefused() {
        assertThatThrownBy(() -> Circuiting.parse(2, 2, List.of(List.of("1-1", "1-2", "2-1"))))
                .isInstanceOf(InputException.class).hasMessageContaining("tube 2-2 belongs to no circuit");
        assertThatThrownBy(() -> Circuiting.parse(2, 2, List.of(List.of("1-1", "1-2", "2-1", "2-2", "1-1"))))
                .isInstanceOf(InputException.class).hasMessageContaining("used twice");
        assertThatThrownBy(() -> Circuiting.parse(2, 2, List.of(List.of("1-1", "1-2", "2-1", "3-2"))))
                .isInstanceOf(InputException.class).hasMessageContaining("not in a coil");
        assertThatThrownBy(() -> Circuiting.parse(2, 2, List.of(List.of("a", "b"))))
                .isInstanceOf(InputException.class).hasMessageContaining("is not a tube label");
    }
}
