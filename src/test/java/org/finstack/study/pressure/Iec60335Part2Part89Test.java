package org.finstack.study.pressure;

import static org.assertj.core.api.Assertions.assertThat;

import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** IEC 60335-2-89:2019 appliance limits against the reported figures. */
class Iec60335Part2Part89Test {

    /**
     * Institute of Refrigeration 2019 and hydrocarbons21 2019 (read): the A3 limit became
     * "approximately 500 g"; 13 x 0.038 = 0.494 kg (the Javadoc's worked example).
     */
    @Test
    void propaneLimitIsAboutFiveHundredGrams() {
        double m = Iec60335Part2Part89.maximumCharge(SafetyClass.A3, 0.038).orElseThrow();
        Reference.assertRelative(0.494, m, 1e-12, "13 x 0.038 by hand");
        Reference.assertRelative(0.5, m, 0.02, "approximately 500 g (read)");
    }

    /** Same sources (read): A2 and A2L "a maximum of 1.2 kg"; R32 would give 3.991 kg uncapped. */
    @Test
    void a2lLimitIsCappedAtOnePointTwoKilograms() {
        assertThat(Iec60335Part2Part89.maximumCharge(SafetyClass.A2L, 0.307).orElseThrow()).isEqualTo(1.2);
        assertThat(Iec60335Part2Part89.maximumCharge(SafetyClass.A2, 0.2).orElseThrow()).isEqualTo(1.2);
        Reference.assertRelative(13 * 0.05, Iec60335Part2Part89.maximumCharge(SafetyClass.A2L, 0.05).orElseThrow(),
                1e-12, "below the ceiling the factor applies");
    }

    @Test
    void classOneAndHigherToxicityClassesAreNotCovered() {
        for (SafetyClass c : new SafetyClass[] {SafetyClass.A1, SafetyClass.B1, SafetyClass.B2L, SafetyClass.B2,
            SafetyClass.B3}) {
            assertThat(Iec60335Part2Part89.maximumCharge(c, 0.1)).as(c.name()).isEmpty();
        }
    }

    /** Read: the 2019 limits were raised from 150 g for every flammable refrigerant of the table. */
    @Test
    void everyLimitOfTheTableIsAboveThePrevious150Grams() {
        for (RefrigerantSafety r : RefrigerantSafetyTable.standard().refrigerants()) {
            var m = Iec60335Part2Part89.maximumCharge(r.safetyClass(), r.lfl().orElse(1));
            m.ifPresent(v -> assertThat(v).as(r.designation()).isGreaterThan(Iec60335Part2Part89.PREVIOUS_EDITION_LIMIT));
        }
    }
}
