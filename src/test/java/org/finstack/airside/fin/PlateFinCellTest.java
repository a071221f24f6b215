package org.finstack.airside.fin;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.junit.jupiter.api.Test;

/** Invariants of {@link PlateFinCell}: derived lengths from the cell's geometry and refusals naming the field. */
class PlateFinCellTest {

    /** Derived lengths: collar radius and the distance to the nearest tube of the next row. */
    @Test
    void derivedLengths() {
        PlateFinCell s = new PlateFinCell(10e-3, 0.1e-3, 24e-3, 18e-3, true);
        assertThat(s.collarRadius()).isEqualTo(5e-3);
        assertThat(s.diagonalPitch()).isCloseTo(Math.sqrt(12e-3 * 12e-3 + 18e-3 * 18e-3), within());
        PlateFinCell i = new PlateFinCell(10e-3, 0.1e-3, 24e-3, 18e-3, false);
        assertThat(i.diagonalPitch()).isEqualTo(18e-3);
    }

    /** Each invalid length is refused with its own field name. */
    @Test
    void rejectsInvalidLengthsNamingTheField() {
        assertField(() -> new PlateFinCell(0, 1e-4, 25e-3, 22e-3, true), "collarDiameter", Msg.NOT_POSITIVE);
        assertField(() -> new PlateFinCell(Double.NaN, 1e-4, 25e-3, 22e-3, true), "collarDiameter", Msg.NOT_A_NUMBER);
        assertField(() -> new PlateFinCell(10e-3, -1e-4, 25e-3, 22e-3, true), "finThickness", Msg.NOT_POSITIVE);
        assertField(() -> new PlateFinCell(10e-3, 1e-4, 0, 22e-3, true), "transversePitch", Msg.NOT_POSITIVE);
        assertField(() -> new PlateFinCell(10e-3, 1e-4, 25e-3, Double.POSITIVE_INFINITY, true), "rowPitch",
                Msg.NOT_A_NUMBER);
    }

    /** Pitches not above the collar diameter would make neighbouring fins overlap. */
    @Test
    void rejectsPitchesNotAboveTheCollar() {
        assertField(() -> new PlateFinCell(10e-3, 1e-4, 10e-3, 22e-3, false), "transversePitch",
                Msg.PITCH_NOT_ABOVE_COLLAR);
        assertField(() -> new PlateFinCell(10e-3, 1e-4, 25e-3, 9e-3, true), "rowPitch",
                Msg.PITCH_NOT_ABOVE_COLLAR);
    }

    private static org.assertj.core.data.Offset<Double> within() {
        return org.assertj.core.data.Offset.offset(1e-15);
    }

    private static void assertField(Runnable r, String field, Msg msg) {
        assertThatThrownBy(r::run).isInstanceOf(InputException.class)
                .satisfies(e -> {
                    assertThat(((InputException) e).field()).isEqualTo(field);
                    assertThat(((InputException) e).msg()).isEqualTo(msg);
                });
    }
}
