package org.finstack.airside.fin;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import org.finstack.core.InputException;
import org.junit.jupiter.api.Test;

/** Checks of {@link SurfaceEffectiveness}. */
class SurfaceEffectivenessTest {

    /** The Javadoc example, repeated verbatim: 1 - 0.9 (1 - 0.8) = 0.82. */
    @Test
    void javadocExample() {
        assertRelative(0.82, SurfaceEffectiveness.of(0.8, 0.9, 1.0), 1e-15, "SurfaceEffectiveness Javadoc example");
    }

    /** Limits: perfect fins give 1, no fins give 1, an all-fin surface gives the fin efficiency. */
    @Test
    void limits() {
        assertThat(SurfaceEffectiveness.of(1.0, 0.9, 1.0)).isEqualTo(1.0);
        assertThat(SurfaceEffectiveness.of(0.4, 0.0, 1.0)).isEqualTo(1.0);
        assertThat(SurfaceEffectiveness.of(0.4, 2.5, 2.5)).isEqualTo(0.4);
        assertThat(SurfaceEffectiveness.of(0.6, 0.5, 1.0)).isGreaterThan(SurfaceEffectiveness.of(0.6, 0.9, 1.0));
    }

    /** Invalid input is refused with the field named. */
    @Test
    void rejectsInvalidInputNamingTheField() {
        assertThatThrownBy(() -> SurfaceEffectiveness.of(0, 0.9, 1)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("etaFin:");
        assertThatThrownBy(() -> SurfaceEffectiveness.of(1.2, 0.9, 1)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("etaFin:");
        assertThatThrownBy(() -> SurfaceEffectiveness.of(0.8, 1.1, 1)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("finArea:");
        assertThatThrownBy(() -> SurfaceEffectiveness.of(0.8, -0.1, 1)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("finArea:");
        assertThatThrownBy(() -> SurfaceEffectiveness.of(0.8, 0.5, 0)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("totalArea:");
        assertThatThrownBy(() -> SurfaceEffectiveness.of(0.8, 0.5, Double.NaN)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("totalArea:");
    }
}
