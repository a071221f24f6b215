package org.finstack.study.cost;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/**
 * Cleaning payback against cases computed here, independently, from the published formulas:
 * COP = eta_II T_e / (T_c - T_e) (Carnot cycle; Stoecker &amp; Jones 1982, chapter 3, from
 * memory), Q = UA dT kept constant, 1 kWh = 3.6 MJ.
 */
class CleaningPaybackTest {

    private static final double HOUR = 3600;
    private static final Tariff EUR = new Tariff(0.20, "EUR");

    private static CleaningCase condenser(double shift, double cleaningCost) {
        return new CleaningCase(FouledCoil.CONDENSER, 10_000, 268.15, 313.15, shift, 0.5, 3000 * HOUR, EUR,
                cleaningCost);
    }

    /** The Javadoc worked example, every step recomputed by hand. */
    @Test
    void condenserWorkedExample() {
        double shift = 15 * 0.2 / (1 - 0.2); // Q = UA dT kept: dT' = dT / (1 - f)
        double copClean = 0.5 * 268.15 / (313.15 - 268.15);
        double copDirty = 0.5 * 268.15 / (313.15 + shift - 268.15);
        double extraPower = 10_000 / copDirty - 10_000 / copClean;
        double kwh = extraPower * 3000 / 1000;
        double cost = kwh * 0.20;
        double years = 250 / cost;

        double computedShift = SaturationShift.fromCapacityLoss(0.2, 15);
        Reference.assertRelative(shift, computedShift, 1e-15, "shift");
        Reference.assertRelative(3.75, computedShift, 1e-15, "Javadoc shift");
        CleaningPayback p = CleaningPayback.of(condenser(computedShift, 250), new Warnings());
        Reference.assertRelative(extraPower, p.extraPower(), 1e-12, "extra power");
        Reference.assertRelative(kwh * 3.6e6, p.extraEnergyPerYear(), 1e-12, "extra energy");
        Reference.assertRelative(cost, p.costPerYear(), 1e-12, "cost per year");
        Reference.assertRelative(years, p.paybackYears().orElseThrow(), 1e-12, "payback");
        // the Javadoc's rounded values
        Reference.assertRelative(279.694, p.extraPower(), 5e-6, "Javadoc extra power");
        Reference.assertRelative(839.083, p.extraEnergyPerYear() / 3.6e6, 5e-6, "Javadoc kWh");
        Reference.assertRelative(167.817, p.costPerYear(), 5e-6, "Javadoc cost");
        Reference.assertRelative(1.48972, p.paybackYears().orElseThrow(), 5e-6, "Javadoc payback");
        assertThat(p.summary()).isEqualTo("Cleaning this condenser would save about 839 kWh and EUR 168 per year;"
                + " at a cleaning cost of EUR 250 it pays back in 18 months.");
    }

    /** A dirty evaporator lowers the evaporating temperature, which enters the COP twice. */
    @Test
    void evaporatorCase() {
        double te = 268.15 - 3.75;
        double extraPower = 10_000 / (0.5 * te / (313.15 - te)) - 10_000 / (0.5 * 268.15 / 45);
        CleaningPayback p = CleaningPayback.of(new CleaningCase(FouledCoil.EVAPORATOR, 10_000, 268.15, 313.15,
                3.75, 0.5, 3000 * HOUR, EUR, 250), new Warnings());
        Reference.assertRelative(extraPower, p.extraPower(), 1e-12, "extra power");
        assertThat(p.extraPower()).as("evaporator shift costs more than the same condenser shift")
                .isGreaterThan(CleaningPayback.of(condenser(3.75, 250), new Warnings()).extraPower());
        assertThat(p.summary()).startsWith("Cleaning this evaporator would save about");
    }

    @Test
    void zeroLossCostsNothingAndNeverPaysBack() {
        double shift = SaturationShift.fromCapacityLoss(0, 15);
        assertThat(shift).isZero();
        CleaningPayback p = CleaningPayback.of(condenser(shift, 250), new Warnings());
        assertThat(p.extraEnergyPerYear()).isZero();
        assertThat(p.costPerYear()).isZero();
        assertThat(p.paybackYears()).isEmpty();
        assertThat(p.summary()).isEqualTo("Cleaning this condenser would save no energy or money (the dirt costs"
                + " nothing at these inputs); at a cleaning cost of EUR 250 it never pays back.");
    }

    @Test
    void freeEnergyOrNoRunningAlsoNeverPaysBack() {
        CleaningCase idle = new CleaningCase(FouledCoil.CONDENSER, 10_000, 268.15, 313.15, 3, 0.5, 0, EUR, 250);
        assertThat(CleaningPayback.of(idle, new Warnings()).paybackYears()).isEmpty();
        CleaningCase free = new CleaningCase(FouledCoil.CONDENSER, 10_000, 268.15, 313.15, 3, 0.5, 3000 * HOUR,
                new Tariff(0, "EUR"), 250);
        assertThat(CleaningPayback.of(free, new Warnings()).summary()).contains("never pays back");
    }

    @Test
    void summaryWordsShortAndLongPaybacks() {
        assertThat(CleaningPayback.of(condenser(3.75, 0), new Warnings()).summary()).endsWith("pays back at once.");
        assertThat(CleaningPayback.of(condenser(3.75, 12.5), new Warnings()).summary())
                .endsWith("at a cleaning cost of EUR 12.50 it pays back in 1 month.");
        // 0.2 K costs 0.2/45 of the clean power: 14.92 W, 44.75 kWh, EUR 8.95 a year
        String slow = CleaningPayback.of(condenser(0.2, 250), new Warnings()).summary();
        assertThat(slow).isEqualTo("Cleaning this condenser would save about 44.8 kWh and EUR 8.95 per year;"
                + " at a cleaning cost of EUR 250 it pays back in about 27.9 years.");
    }

    /** More capacity loss costs more each year and pays a cleaning back sooner. */
    @Property(tries = 200)
    void moreLossCostsMoreAndPaysBackSooner(@ForAll @DoubleRange(min = 0.01, max = 0.6) double loss,
            @ForAll @DoubleRange(min = 0.01, max = 0.2) double more) {
        CleaningPayback a = CleaningPayback.of(condenser(SaturationShift.fromCapacityLoss(loss, 15), 250),
                new Warnings());
        CleaningPayback b = CleaningPayback.of(condenser(SaturationShift.fromCapacityLoss(loss + more, 15), 250),
                new Warnings());
        assertThat(b.costPerYear()).isGreaterThan(a.costPerYear());
        assertThat(b.paybackYears().orElseThrow()).isLessThan(a.paybackYears().orElseThrow());
    }

    @Test
    void badInputsAreRejectedNamingTheField() {
        assertThatThrownBy(() -> SaturationShift.fromCapacityLoss(1, 15)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("capacityLoss:");
        assertThatThrownBy(() -> SaturationShift.fromCapacityLoss(-0.1, 15)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("capacityLoss:");
        assertThatThrownBy(() -> condenser(-1, 250)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("saturationShift:");
        assertThatThrownBy(() -> condenser(1, -250)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("cleaningCost:");
        assertThatThrownBy(() -> new CleaningCase(FouledCoil.CONDENSER, 10_000, 268.15, 313.15, 1, 0.5,
                9000 * 24 * HOUR, EUR, 1)).isInstanceOf(InputException.class).hasMessageStartingWith("runTimePerYear:");
        assertThatThrownBy(() -> new Tariff(0.2, " ")).isInstanceOf(InputException.class)
                .hasMessageStartingWith("tariff.currency:");
        assertThatThrownBy(() -> new CleaningCase(FouledCoil.CONDENSER, 10_000, 313.15, 268.15, 1, 0.5,
                HOUR, EUR, 1)).isInstanceOf(InputException.class).hasMessageStartingWith("condensingTemperature:");
    }
}
