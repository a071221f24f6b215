package org.finstack.study.pressure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** EN 378-1 Annex C charge limits by hand from the formulas and against figures read elsewhere. */
class En378Part1AnnexCTest {

    /**
     * The Javadoc's worked example, by hand: 0.038^1.25 = exp(1.25 ln 0.038) = 0.016777587;
     * 2.5 x 0.016777587 x 1.8 x 20^0.5 (4.4721360) = 0.33764 kg.
     */
    @Test
    void roomFormulaWorkedExampleR290WallMountedTwentySquareMetres() {
        double m = En378Part1AnnexC.roomFormulaMaxCharge(0.038, En378Part1AnnexC.ReleaseHeight.WALL.height(), 20,
                Warnings.discard());
        Reference.assertRelative(2.5 * 0.016777587 * 1.8 * 4.4721360, m, 1e-5, "by hand");
        Reference.assertRelative(0.33764, m, 1e-4, "Javadoc value");
    }

    /**
     * ASERCOM 2019 (read): IEC 60335-2-40 raised the R290 limit of a standard split system to
     * 988 g, which is m2 = 26 m3 x 0.038 kg/m3.
     */
    @Test
    void m2ForR290IsTheAsercom988Grams() {
        Reference.assertRelative(0.988, En378Part1AnnexC.m2(0.038), 1e-12, "ASERCOM 2019, 988 g");
    }

    /**
     * An installation manual quoting EN 378 (Harford Duracool, read) applies the practical-limit
     * rule to charges above 0.15 kg of hydrocarbon; m1 = 4 m3 x 0.038 = 0.152 kg, within rounding.
     */
    @Test
    void m1ForR290IsTheManualsHundredFiftyGrams() {
        Reference.assertRelative(0.15, En378Part1AnnexC.m1(0.038), 0.02, "150 g threshold");
        Reference.assertRelative(130 * 0.038, En378Part1AnnexC.m3(0.038), 1e-12, "m3 by hand");
    }

    /** By hand: 0.008 kg/m3 x 50 m3 = 0.4 kg (the practical limit of the Harford manual, read). */
    @Test
    void practicalLimitRuleByHand() {
        Reference.assertRelative(0.4, En378Part1AnnexC.practicalLimitMaxCharge(0.008, 50), 1e-12, "PL x V");
    }

    @Test
    void minimumFloorAreaInvertsTheRoomFormula() {
        double m = En378Part1AnnexC.roomFormulaMaxCharge(0.307, 2.2, 35, Warnings.discard());
        Reference.assertRelative(35, En378Part1AnnexC.minimumFloorArea(m, 0.307, 2.2), 1e-12, "A from m");
    }

    @Test
    void roomFormulaGrowsWithAreaHeightAndLfl() {
        double base = En378Part1AnnexC.roomFormulaMaxCharge(0.038, 1.8, 20, Warnings.discard());
        assertThat(En378Part1AnnexC.roomFormulaMaxCharge(0.038, 1.8, 40, Warnings.discard())).isGreaterThan(base);
        assertThat(En378Part1AnnexC.roomFormulaMaxCharge(0.038, 2.2, 20, Warnings.discard())).isGreaterThan(base);
        assertThat(En378Part1AnnexC.roomFormulaMaxCharge(0.307, 1.8, 20, Warnings.discard())).isGreaterThan(base);
        // quadrupling the area doubles the charge (square root), by hand
        Reference.assertRelative(2 * base, En378Part1AnnexC.roomFormulaMaxCharge(0.038, 1.8, 80, Warnings.discard()),
                1e-12, "A x 4");
    }

    @Test
    void releaseHeightOutsideTheTabulatedHeightsWarns() {
        Warnings w = new Warnings();
        En378Part1AnnexC.roomFormulaMaxCharge(0.038, 3.0, 20, w);
        assertThat(w.list()).singleElement().asString().contains("h0");
        Warnings ok = new Warnings();
        for (En378Part1AnnexC.ReleaseHeight h : En378Part1AnnexC.ReleaseHeight.values()) {
            En378Part1AnnexC.roomFormulaMaxCharge(0.038, h.height(), 20, ok);
        }
        assertThat(ok.isEmpty()).isTrue();
    }

    @Test
    void invalidInputsAreRefusedNamingTheField() {
        assertThatThrownBy(() -> En378Part1AnnexC.roomFormulaMaxCharge(0.038, 1.8, 0, Warnings.discard()))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("room.floorArea"));
        assertThatThrownBy(() -> En378Part1AnnexC.m1(Double.NaN))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("refrigerant.lfl"));
        assertThatThrownBy(() -> En378Part1AnnexC.practicalLimitMaxCharge(0.008, -1))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("room.volume"));
    }
}
