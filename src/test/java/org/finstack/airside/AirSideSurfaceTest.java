package org.finstack.airside;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.junit.jupiter.api.Test;

/** Invariants of the air-side surface record (the unit-cell area ratio by hand, refusals naming the field). */
class AirSideSurfaceTest {

    private static InputException rejected(Runnable r) {
        try {
            r.run();
        } catch (InputException e) {
            return e;
        }
        throw new AssertionError("expected an InputException");
    }

    @Test
    void plainSurfaceNeedsNoPatternParameters() {
        AirSideSurface s = AirSideSurface.plain(10.23e-3, 25.4e-3, 22e-3, 2.23e-3, 0.115e-3, 2, 2.76e-3, true);
        assertThat(s.pattern()).isSameAs(AirSideSurface.Pattern.Plain.INSTANCE);
        assertThat(s.finType()).isEqualTo("plain");
    }

    @Test
    void patternsNameTheirFinType() {
        assertThat(new AirSideSurface.Pattern.Wavy(1.2e-3, 4.8e-3).finType()).isEqualTo("wavy");
        assertThat(new AirSideSurface.Pattern.Louvered(1.7e-3, 0.9e-3).finType()).isEqualTo("louvered");
        assertThat(rejected(() -> new AirSideSurface.Pattern.Wavy(0, 4.8e-3)).field()).isEqualTo("pattern.waveHeight");
        assertThat(rejected(() -> new AirSideSurface.Pattern.Louvered(1.7e-3, Double.NaN)).field())
                .isEqualTo("pattern.louverHeight");
    }

    @Test
    void invalidDimensionsNameTheirField() {
        assertThat(rejected(() -> AirSideSurface.plain(0, 25.4e-3, 22e-3, 2.23e-3, 0.115e-3, 2, 2.76e-3, true)).field())
                .isEqualTo("collarDiameter");
        assertThat(rejected(() -> AirSideSurface.plain(10e-3, 25.4e-3, 22e-3, 2.23e-3, 0.115e-3, 0, 2.76e-3, true)).field())
                .isEqualTo("rows");
        assertThat(rejected(() -> AirSideSurface.plain(10e-3, 25.4e-3, 22e-3, 2.23e-3, 0.115e-3, 2, Double.NaN, true))
                .field()).isEqualTo("hydraulicDiameter");
        InputException pitch = rejected(() -> AirSideSurface.plain(10e-3, 25.4e-3, 22e-3, 0.1e-3, 0.115e-3, 2, 2.76e-3, true));
        assertThat(pitch.field()).isEqualTo("finPitch");
        assertThat(pitch.msg()).isEqualTo(Msg.PITCH_NOT_ABOVE_THICKNESS);
        InputException pt = rejected(() -> AirSideSurface.plain(10e-3, 9e-3, 22e-3, 2.23e-3, 0.115e-3, 2, 2.76e-3, true));
        assertThat(pt.field()).isEqualTo("transversePitch");
        assertThat(pt.msg()).isEqualTo(Msg.PITCH_NOT_ABOVE_COLLAR);
        // inline rows closer than the collar diameter overlap; staggered ones are spaced on the diagonal
        assertThat(rejected(() -> AirSideSurface.plain(10e-3, 25.4e-3, 8e-3, 2.23e-3, 0.115e-3, 2, 2.76e-3, false)).field())
                .isEqualTo("rowPitch");
        assertThat(AirSideSurface.plain(10e-3, 25.4e-3, 8e-3, 2.23e-3, 0.115e-3, 2, 2.76e-3, true).rowPitch())
                .isEqualTo(8e-3);
        assertThatThrownBy(() -> new AirSideSurface(10e-3, 25.4e-3, 22e-3, 2.23e-3, 0.115e-3, 2, 2.76e-3, true, null))
                .isInstanceOf(InputException.class).hasMessageContaining("pattern");
    }

    @Test
    void bareTubeAreaRatioMatchesTheUnitCell() {
        // per tube and fin pitch: Ao = 2 (Pt Pl - pi Dc^2/4) + pi Dc (Fp - t), At = pi (Dc - 2t) Fp;
        // hand evaluation for Dc = 10 mm, t = 0.1 mm, Pt = 25 mm, Pl = 20 mm, Fp = 2 mm:
        // Ao = 2 (500 - 78.5398) + pi 10 1.9 = 842.9204 + 59.6903 = 902.6107 mm2,
        // At = pi 9.8 2 = 61.5752 mm2, Ao/At = 14.6587
        AirSideSurface s = AirSideSurface.plain(10e-3, 25e-3, 20e-3, 2e-3, 0.1e-3, 3, 2.5e-3, true);
        assertThat(s.bareTubeAreaRatio()).isCloseTo(14.6587, org.assertj.core.data.Offset.offset(1e-4));
        // denser fins carry more area per unit of tube
        AirSideSurface dense = AirSideSurface.plain(10e-3, 25e-3, 20e-3, 1.5e-3, 0.1e-3, 3, 2.0e-3, true);
        assertThat(dense.bareTubeAreaRatio()).isGreaterThan(s.bareTubeAreaRatio());
        assertThat(rejected(() -> AirSideSurface.plain(0.2e-3, 25e-3, 20e-3, 2e-3, 0.1e-3, 3, 2.5e-3, true)).field())
                .isEqualTo("finThickness");
    }

    @Test
    void jfRejectsNonPositiveFactors() {
        assertThat(new JF(0.01, 0.05).j()).isEqualTo(0.01);
        assertThat(rejected(() -> new JF(0, 0.05)).field()).isEqualTo("j");
        assertThat(rejected(() -> new JF(0.01, Double.NaN)).field()).isEqualTo("f");
    }
}
