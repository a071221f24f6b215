package org.finstack.coil;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import org.finstack.airside.AirSideSurface;
import org.finstack.airside.JF;
import org.finstack.airside.WangLeeChangLin1999LouveredFin;
import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.geometry.CoilGeometry;
import org.finstack.geometry.CoilGeometry.FinPattern;
import org.finstack.geometry.DerivedGeometry;
import org.finstack.testing.Coils;
import org.junit.jupiter.api.Test;

/**
 * Fin patterns from the coil description to the rating: the pattern parameters reach the
 * air-side correlation, missing or misplaced parameters are refused naming the field, and a
 * louvered coil out-rates the same coil with plain fins (common practice).
 */
class FinPatternRatingTest {

    private static final IsothermalCoilModel MODEL = new IsothermalCoilModel();

    private static CoilGeometry louvered() {
        return Coils.exampleCondenser().withFinPattern("louvered", FinPattern.louvered(2.4e-3, 1.0e-3));
    }

    private static InputException refused(Runnable r) {
        try {
            r.run();
        } catch (InputException e) {
            return e;
        }
        throw new AssertionError("expected an InputException");
    }

    @Test
    void louverParametersReachTheCorrelation() {
        CoilGeometry g = louvered();
        Rating r = MODEL.rate(IsothermalCoilModelTest.condenser(g));
        DerivedGeometry d = g.derive();
        AirSideSurface s = new AirSideSurface(d.collarDiameter(), g.transversePitch(), g.rowPitch(), g.finPitch(),
                g.finThickness(), g.rows(), d.hydraulicDiameter(), true, new AirSideSurface.Pattern.Louvered(2.4e-3, 1.0e-3));
        JF expected = WangLeeChangLin1999LouveredFin.INSTANCE.evaluate(s, r.reynoldsDc(), Warnings.discard());
        assertRelative(expected.j(), r.colburnJ(), 1e-12, "rating j = louvered correlation at the rating's ReDc");
        assertRelative(expected.f(), r.frictionF(), 1e-12, "rating f = louvered correlation at the rating's ReDc");
        assertThat(r.methods()).contains(WangLeeChangLin1999LouveredFin.SOURCE);
        // Ao/At of the surface equals the coil's own areas (same unit cell, edges not counted)
        assertRelative(d.airSideArea() / d.tubeOuterArea(), s.bareTubeAreaRatio(), 1e-12, "Ao/At");
    }

    @Test
    void louveredCoilOutRatesThePlainCoil() {
        // common practice: louvers raise capacity and air-side pressure drop at the same face velocity
        Rating plain = MODEL.rate(IsothermalCoilModelTest.condenser(Coils.exampleCondenser()));
        Rating louvered = MODEL.rate(IsothermalCoilModelTest.condenser(louvered()));
        assertThat(louvered.colburnJ()).isGreaterThan(plain.colburnJ());
        assertThat(louvered.capacity()).isGreaterThan(plain.capacity());
        assertThat(louvered.airPressureDrop()).isGreaterThan(plain.airPressureDrop());
        assertThat(louvered.warnings()).isEmpty();
    }

    @Test
    void missingOrMisplacedPatternParametersNameTheirField() {
        CoilGeometry plain = Coils.exampleCondenser();
        assertThat(refused(() -> plain.withFinPattern("wavy", FinPattern.NONE)).field()).isEqualTo("waveHeight");
        assertThat(refused(() -> plain.withFinPattern("wavy", new FinPattern(1.2e-3, 0, 0, 0))).field())
                .isEqualTo("waveLength");
        assertThat(refused(() -> plain.withFinPattern("louvered", FinPattern.NONE)).field()).isEqualTo("louverPitch");
        assertThat(refused(() -> plain.withFinPattern("louvered", new FinPattern(0, 0, 2.4e-3, 0))).field())
                .isEqualTo("louverHeight");
        InputException misplaced = refused(() -> plain.withFinPattern("plain", FinPattern.louvered(2.4e-3, 1e-3)));
        assertThat(misplaced.field()).isEqualTo("louverPitch");
        assertThat(misplaced.getMessage()).contains("louvered").contains("plain");
        assertThat(refused(() -> plain.withFinPattern("louvered", new FinPattern(1.2e-3, 0, 2.4e-3, 1e-3))).field())
                .isEqualTo("waveHeight");
        assertThat(refused(() -> FinPattern.wavy(-1e-3, 4e-3)).field()).isEqualTo("waveHeight");
        assertThat(refused(() -> FinPattern.louvered(Double.NaN, 1e-3)).field()).isEqualTo("louverPitch");
        assertThat(refused(() -> plain.withFinPattern("louvered", FinPattern.louvered(22e-3, 1e-3))).field())
                .isEqualTo("louverPitch");
        assertThat(refused(() -> plain.withFinPattern("wavy", FinPattern.wavy(1.2e-3, 30e-3))).field())
                .isEqualTo("waveLength");
        // the fin type is matched in any case, as the correlation registry does
        Rating upper = MODEL.rate(IsothermalCoilModelTest.condenser(
                plain.withFinPattern(" Louvered", FinPattern.louvered(2.4e-3, 1.0e-3))));
        assertRelative(MODEL.rate(IsothermalCoilModelTest.condenser(louvered())).capacity(), upper.capacity(), 1e-12,
                "capacity with fin type written \" Louvered\"");
        // a plain coil needs nothing, and the pattern survives the with-methods
        assertThat(plain.finPattern()).isEqualTo(FinPattern.NONE);
        assertThat(louvered().withRows(4).finPattern()).isEqualTo(FinPattern.louvered(2.4e-3, 1.0e-3));
    }

    @Test
    void wavyCoilIsDescribedButNotRatedWithoutACorrelation() {
        CoilGeometry wavy = Coils.exampleCondenser().withFinPattern("wavy", FinPattern.wavy(1.2e-3, 5.5e-3));
        assertThat(wavy.finPattern().waveLength()).isEqualTo(5.5e-3);
        assertThatThrownBy(() -> MODEL.rate(IsothermalCoilModelTest.condenser(wavy)))
                .isInstanceOf(InputException.class)
                .hasMessageStartingWith("coil.finType:")
                .hasMessageContaining("wavy");
    }

    @Test
    void oneRowLouveredCoilIsRefusedNamingTheRows() {
        assertThatThrownBy(() -> MODEL.rate(IsothermalCoilModelTest.condenser(louvered().withRows(1))))
                .isInstanceOf(InputException.class)
                .hasMessageStartingWith("coil.rows:");
    }
}
