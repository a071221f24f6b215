package org.finstack.study.cost;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/**
 * {@link CleaningCase#fromCapacityLoss} against the published relations worked here by hand:
 * COP = eta_II T_e / (T_c - T_e) (Carnot cycle; Stoecker &amp; Jones 1982, chapter 3, from
 * memory), a condenser's heat rejection Q_rej = Q_evap + W = Q_evap (1 + 1/COP) (first law), and
 * Q = UA dT kept constant, so dT' = dT / (1 - f).
 */
class CleaningCaseFromCapacityLossTest {

    private static final double HOUR = 3600;
    private static final Tariff EUR = new Tariff(0.20, "EUR");

    /** The Javadoc worked example, then the payback it leads to, every step recomputed by hand. */
    @Test
    void condenserJavadocExample() {
        double te = 268.15;
        double tc = 313.15;
        double cop = 0.5 * te / (tc - te);
        double qEvap = 12_000 / (1 + 1 / cop);
        double shift = 15 * 0.2 / (1 - 0.2);
        double extraPower = qEvap / (0.5 * te / (tc + shift - te)) - qEvap / cop;
        double cost = extraPower * 3000 / 1000 * 0.20;

        CleaningCase c = CleaningCase.fromCapacityLoss(FouledCoil.CONDENSER, 12_000, tc, 15, 0.2, te, 0.5,
                3000 * HOUR, EUR, 250);
        Reference.assertRelative(qEvap, c.duty(), 1e-12, "refrigerating duty");
        Reference.assertRelative(8984.50, c.duty(), 5e-6, "Javadoc refrigerating duty");
        Reference.assertRelative(shift, c.saturationShift(), 1e-15, "shift");
        assertThat(c.evaporatingTemperature()).isEqualTo(te);
        assertThat(c.condensingTemperature()).isEqualTo(tc);
        assertThat(c.dirtyCondensingTemperature()).isEqualTo(tc + c.saturationShift());
        CleaningPayback p = CleaningPayback.of(c, new Warnings());
        Reference.assertRelative(extraPower, p.extraPower(), 1e-12, "extra power");
        Reference.assertRelative(cost, p.costPerYear(), 1e-12, "cost per year");
        Reference.assertRelative(250 / cost, p.paybackYears().orElseThrow(), 1e-12, "payback");
    }

    /** An evaporator's duty is the refrigerating duty as it stands; its evaporating temperature falls. */
    @Test
    void evaporatorKeepsItsDutyAndLowersTheEvaporatingTemperature() {
        double te = 266.15;
        double tc = 313.15;
        double shift = 8 * 0.1 / (1 - 0.1);
        double extraPower = 5000 / (0.45 * (te - shift) / (tc - te + shift)) - 5000 / (0.45 * te / (tc - te));
        CleaningCase c = CleaningCase.fromCapacityLoss(FouledCoil.EVAPORATOR, 5000, te, 8, 0.1, tc, 0.45,
                5000 * HOUR, EUR, 180);
        assertThat(c.duty()).isEqualTo(5000);
        assertThat(c.evaporatingTemperature()).isEqualTo(te);
        Reference.assertRelative(te - shift, c.dirtyEvaporatingTemperature(), 1e-15, "dirty evaporating temperature");
        Reference.assertRelative(extraPower, CleaningPayback.of(c, new Warnings()).extraPower(), 1e-12, "extra power");
    }

    @Test
    void cleanCoilCostsNothing() {
        CleaningCase c = CleaningCase.fromCapacityLoss(FouledCoil.CONDENSER, 12_000, 313.15, 15, 0, 268.15, 0.5,
                3000 * HOUR, EUR, 250);
        assertThat(c.saturationShift()).isZero();
        assertThat(CleaningPayback.of(c, new Warnings()).paybackYears()).isEmpty();
    }

    @Test
    void otherTemperatureOnTheWrongSideIsRefusedWithItsField() {
        assertThatThrownBy(() -> CleaningCase.fromCapacityLoss(FouledCoil.CONDENSER, 12_000, 313.15, 15, 0.2, 320,
                0.5, 3000 * HOUR, EUR, 250)).isInstanceOf(InputException.class).hasMessageStartingWith(
                        "condensingTemperature");
        assertThatThrownBy(() -> CleaningCase.fromCapacityLoss(FouledCoil.EVAPORATOR, 5000, 266.15, 8, 1.0, 313.15,
                0.5, 3000 * HOUR, EUR, 250)).isInstanceOf(InputException.class).hasMessageStartingWith("capacityLoss");
    }
}
