package org.finstack.study.pressure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.OptionalDouble;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** The refrigerant safety table: coverage, consistency, and the values that could be read. */
class RefrigerantSafetyTableTest {

    private final RefrigerantSafetyTable table = RefrigerantSafetyTable.standard();

    @Test
    void holdsEveryRefrigerantTheStudyNeeds() {
        List<String> wanted = List.of("R134a", "R32", "R125", "R143a", "R744", "R717", "R290", "R600a", "R1270",
                "R1234yf", "R1234ze(E)", "R22", "R410A", "R404A", "R407C", "R507A", "R448A", "R449A", "R454B",
                "R513A", "R407F");
        assertThat(table.refrigerants()).extracting(RefrigerantSafety::designation)
                .containsExactlyInAnyOrderElementsOf(wanted);
    }

    /** ASERCOM 2019 (read): 988 g = 26 m3 x LFL for R290, so LFL = 0.038 kg/m3. */
    @Test
    void propaneLflAgreesWithTheAsercom988Grams() {
        RefrigerantSafety r = table.find("refrigerant", "R290");
        Reference.assertRelative(0.988, 26 * r.lfl().orElseThrow(), 1e-12, "26 m3 x LFL");
        assertThat(r.safetyClass()).isEqualTo(SafetyClass.A3);
    }

    /** Harford Duracool manual quoting EN 378 (read): practical limit 0.008 kg/m3 for hydrocarbon. */
    @Test
    void propanePracticalLimitIsTheManualsValue() {
        assertThat(table.find("refrigerant", "R290").practicalLimit()).isEqualTo(0.008);
    }

    /**
     * Common knowledge of the trade: the class-1 refrigerants here have no LFL, the flammable ones
     * do, the practical limit of a flammable refrigerant lies well below its LFL (EN 378 takes about
     * a fifth of it for hydrocarbons), and R717 is the one higher-toxicity refrigerant here.
     */
    @Test
    void classesLflsAndPracticalLimitsAreConsistent() {
        for (RefrigerantSafety r : table.refrigerants()) {
            assertThat(r.lfl().isPresent()).as(r.designation()).isEqualTo(r.safetyClass().flammable());
            r.lfl().ifPresent(l -> {
                assertThat(l).as(r.designation()).isBetween(0.03, 0.35);
                assertThat(r.practicalLimit()).as(r.designation()).isLessThanOrEqualTo(0.3 * l);
            });
            assertThat(r.practicalLimit()).as(r.designation()).isBetween(1e-4, 0.6);
            assertThat(r.safetyClass().higherToxicity()).as(r.designation()).isEqualTo(r.designation().equals("R717"));
        }
    }

    @Test
    void everyEntryNamesAResolvableSourceAndRecalledValuesSaySo() {
        for (RefrigerantSafety r : table.refrigerants()) {
            assertThat(table.references()).containsValue(r.source());
            assertThat(r.note()).as(r.designation()).isNotBlank();
            if (r.source().key().endsWith("-memory")) {
                assertThat(r.note()).as(r.designation()).contains("from memory");
            }
        }
    }

    @Test
    void designationsAreMatchedLoosely() {
        assertThat(table.find("f", "r-290").designation()).isEqualTo("R290");
        assertThat(table.find("f", "R 1234ze(e)").designation()).isEqualTo("R1234ze(E)");
        assertThat(table.find("f", " r410a ").designation()).isEqualTo("R410A");
        assertThatThrownBy(() -> table.find("refrigerant.name", "R12"))
                .isInstanceOfSatisfying(InputException.class, e -> {
                    assertThat(e.field()).isEqualTo("refrigerant.name");
                    assertThat(e.msg()).isEqualTo(Msg.UNKNOWN_NAME);
                });
    }

    @Test
    void safetyClassesParseAndCallerDataIsChecked() {
        assertThat(SafetyClass.parse("c", " a2l ")).isEqualTo(SafetyClass.A2L);
        assertThatThrownBy(() -> SafetyClass.parse("refrigerant.safetyClass", "A4"))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.msg()).isEqualTo(Msg.UNKNOWN_NAME));
        Citation sds = Citation.of("SDS", "supplier safety data sheet");
        assertThatThrownBy(() -> RefrigerantSafety.of("R32", SafetyClass.A2L, Double.NaN, 0.061, sds))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("refrigerant.lfl"));
        assertThatThrownBy(() -> RefrigerantSafety.of("R134a", SafetyClass.A1, 0.3, 0.25, sds))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("refrigerant.lfl"));
        assertThatThrownBy(() -> RefrigerantSafety.of("R134a", SafetyClass.A1, Double.NaN, 0, sds))
                .isInstanceOfSatisfying(InputException.class,
                        e -> assertThat(e.field()).isEqualTo("refrigerant.practicalLimit"));
        assertThat(RefrigerantSafety.of("R32", SafetyClass.A2L, 0.307, 0.061, sds).lfl())
                .isEqualTo(OptionalDouble.of(0.307));
    }
}
