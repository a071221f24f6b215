package org.finstack.study.cost;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** The Carnot COP approximation (Stoecker &amp; Jones 1982, chapter 3; chapter from memory). */
class CarnotCopTest {

    /** Javadoc worked example, recomputed from COP_Carnot = T_e / (T_c - T_e). */
    @Test
    void javadocWorkedExample() {
        double te = 273.15 - 5;
        double tc = 273.15 + 40;
        double byFormula = 0.5 * te / (tc - te);
        Warnings w = new Warnings();
        Reference.assertRelative(byFormula, CarnotCop.cop(te, tc, 0.5, w), 1e-15, "COP");
        Reference.assertRelative(2.97944, CarnotCop.cop(te, tc, 0.5, w), 2e-6, "Javadoc COP");
        Reference.assertRelative(3356.33, CarnotCop.compressorPower(10_000, te, tc, 0.5, w), 2e-6, "Javadoc W");
        assertThat(w.isEmpty()).isTrue();
    }

    /**
     * The trade's rule of thumb (common practice): about 2 to 4 % more compressor power per kelvin
     * of higher condensing temperature. With a constant eta_II the approximation gives exactly
     * 1/lift per kelvin, inside that band for lifts between 25 and 50 K.
     */
    @Test
    void penaltyPerKelvinMatchesTheRuleOfThumbAtUsualLifts() {
        Warnings w = new Warnings();
        for (double te = 263.15; te <= 283.15; te += 5) {
            for (double lift : new double[] {26, 30, 35, 40, 45, 49}) {
                double w0 = CarnotCop.compressorPower(1000, te, te + lift, 0.5, w);
                double w1 = CarnotCop.compressorPower(1000, te, te + lift + 1, 0.5, w);
                double perKelvin = w1 / w0 - 1;
                assertThat(perKelvin).as("te %s lift %s", te, lift).isBetween(0.02, 0.04);
            }
        }
    }

    @Test
    void warnsOutsideTheRangeOfSingleStagePlant() {
        Warnings w = new Warnings();
        CarnotCop.cop(233.15, 323.15, 0.9, w);
        assertThat(w.list()).hasSize(2).allMatch(s -> s.contains("common practice"));
    }

    @Test
    void rejectsImpossibleTemperaturesAndEfficiencies() {
        assertThatThrownBy(() -> CarnotCop.cop(300, 300, 0.5, new Warnings())).isInstanceOf(InputException.class)
                .hasMessageStartingWith("condensingTemperature:");
        assertThatThrownBy(() -> CarnotCop.cop(270, 310, 1.5, new Warnings())).isInstanceOf(InputException.class)
                .hasMessageStartingWith("secondLawEfficiency:");
        assertThatThrownBy(() -> CarnotCop.cop(-1, 310, 0.5, new Warnings())).isInstanceOf(InputException.class)
                .hasMessageStartingWith("evaporatingTemperature:");
    }
}
