package org.finstack.study.pressure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.finstack.core.InputException;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** Charge screening: which limit applies, by hand from the EN 378-1 and IEC 60335-2-89 formulas. */
class ChargeScreeningTest {

    private final RefrigerantSafetyTable table = RefrigerantSafetyTable.standard();

    /**
     * The Javadoc's worked example: R290, 0.30 kg, wall-mounted, 20 m2, 50 m3. By hand: practical
     * limit 0.008 x 50 = 0.4 kg; room formula 0.33764 kg, between m1 0.152 and m2 0.988 kg;
     * the room formula governs and 0.30 kg is within it.
     */
    @Test
    void workedExamplePropaneWallUnitInTwentySquareMetres() {
        ChargeScreeningResult r = ChargeScreening.screen(table.find("r", "R290"), 50, 20, 1.8, 0.30, false);
        assertThat(r.limits()).hasSize(2);
        Reference.assertRelative(0.4, r.limits().get(0).maxCharge(), 1e-12, "PL x V");
        assertThat(r.governing().name()).isEqualTo("EN 378-1 room formula");
        Reference.assertRelative(0.33764, r.governing().maxCharge(), 1e-4, "room formula");
        assertThat(r.within()).isTrue();
        assertThat(r.statement()).isEqualTo(ChargeScreening.STATEMENT).contains("local codes govern");
        assertThat(r.notes()).anyMatch(n -> n.contains("m1 = 0.152 kg"));
    }

    /** By hand: R410A (A1, practical limit 0.44 kg/m3) in 50 m3 allows 22 kg; only that limit applies. */
    @Test
    void classOneRefrigerantMeetsOnlyThePracticalLimit() {
        ChargeScreeningResult r = ChargeScreening.screen(table.find("r", "R410A"), 50, 20, 1.8, 10, true);
        assertThat(r.limits()).singleElement();
        Reference.assertRelative(22, r.governing().maxCharge(), 1e-12, "0.44 x 50");
        assertThat(r.within()).isTrue();
        assertThat(ChargeScreening.screen(table.find("r", "R410A"), 50, 20, 1.8, 23, true).within()).isFalse();
    }

    /**
     * Self-contained appliance with R290 in a large shop (500 m3, 200 m2, floor unit): practical
     * limit 4 kg, room formula 2.5 x 0.016777587 x 0.6 x 200^0.5 = 0.35591 kg, IEC 60335-2-89
     * 13 x 0.038 = 0.494 kg. The room formula governs at 0.356 kg.
     */
    @Test
    void appliancePropaneInAShop() {
        ChargeScreeningResult r = ChargeScreening.screen(table.find("r", "R290"), 500, 200, 0.6, 0.4, true);
        assertThat(r.limits()).hasSize(3);
        assertThat(r.governing().name()).isEqualTo("EN 378-1 room formula");
        Reference.assertRelative(2.5 * 0.016777587 * 0.6 * Math.sqrt(200), r.governing().maxCharge(), 1e-5, "by hand");
        assertThat(r.within()).isFalse();
        assertThat(r.limits()).anyMatch(l -> l.name().startsWith("IEC 60335-2-89") && Math.abs(l.maxCharge() - 0.494) < 1e-12);
    }

    /**
     * A ceiling unit with R32 in a large hall (2000 m3, 400 m2): the room formula,
     * 2.5 x 0.307^1.25 x 2.2 x 20 = 25.1 kg, exceeds m2 = 26 x 0.307 = 7.982 kg, so m2 applies;
     * the practical limit allows 0.061 x 2000 = 122 kg.
     */
    @Test
    void largeRoomIsCappedAtM2() {
        ChargeScreeningResult r = ChargeScreening.screen(table.find("r", "R32"), 2000, 400, 2.2, 9, false);
        assertThat(r.governing().name()).startsWith("EN 378-1 m2");
        Reference.assertRelative(7.982, r.governing().maxCharge(), 1e-12, "m2 = 26 x 0.307");
        assertThat(r.within()).isFalse();
        assertThat(r.notes()).anyMatch(n -> n.contains("exceeds m2"));
        assertThat(r.notes()).anyMatch(n -> n.contains("class 2L"));
    }

    /**
     * A tiny room where the room formula falls below m1 (R32, floor unit, 1 m2:
     * 2.5 x 0.307^1.25 x 0.6 x 1 = 0.3428 kg &lt; m1 = 1.228 kg): m1 is the flammability limit, the
     * practical limit 0.061 x 2.5 = 0.1525 kg governs, and the note says the screen is conservative.
     */
    @Test
    void tinyRoomFallsBackToM1AndThePracticalLimitGoverns() {
        ChargeScreeningResult r = ChargeScreening.screen(table.find("r", "R32"), 2.5, 1, 0.6, 1.0, false);
        assertThat(r.limits()).anyMatch(l -> l.name().startsWith("EN 378-1 m1")
                && Math.abs(l.maxCharge() - 1.228) < 1e-12);
        Reference.assertRelative(0.1525, r.governing().maxCharge(), 1e-12, "0.061 x 2.5");
        assertThat(r.within()).isFalse();
        assertThat(r.notes()).anyMatch(n -> n.contains("at or below m1"));
    }

    /** Ammonia: higher toxicity; its practical limit (0.00035 kg/m3) governs by far. */
    @Test
    void ammoniaIsGovernedByToxicity() {
        ChargeScreeningResult r = ChargeScreening.screen(table.find("r", "R717"), 1000, 300, 2.2, 1, false);
        Reference.assertRelative(0.35, r.governing().maxCharge(), 1e-12, "0.00035 x 1000");
        assertThat(r.notes()).anyMatch(n -> n.contains("higher toxicity"));
    }

    @Test
    void largerRoomNeverLowersTheGoverningLimit() {
        RefrigerantSafety r290 = table.find("r", "R290");
        double previous = 0;
        for (double area = 2; area < 400; area *= 1.5) {
            double limit = ChargeScreening.screen(r290, area * 2.5, area, 1.8, 0.1, true).governing().maxCharge();
            assertThat(limit).as("area %s m2", area).isGreaterThanOrEqualTo(previous);
            previous = limit;
        }
    }

    @Test
    void invalidInputsAreRefusedNamingTheField() {
        RefrigerantSafety r290 = table.find("r", "R290");
        assertThatThrownBy(() -> ChargeScreening.screen(r290, 50, 20, 1.8, 0, false))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("charge"));
        assertThatThrownBy(() -> ChargeScreening.screen(r290, Double.NaN, 20, 1.8, 1, false))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("room.volume"));
        assertThatThrownBy(() -> ChargeScreening.screen(null, 50, 20, 1.8, 1, false))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("refrigerant"));
        assertThatThrownBy(() -> ChargeScreening.screen(r290, 50, 20, -1, 1, false))
                .isInstanceOfSatisfying(InputException.class,
                        e -> assertThat(e.field()).isEqualTo("room.releaseHeight"));
    }
}
