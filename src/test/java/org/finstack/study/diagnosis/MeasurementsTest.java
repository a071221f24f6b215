package org.finstack.study.diagnosis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import java.util.List;
import org.finstack.coil.Duty;
import org.finstack.core.InputException;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/**
 * Readings: physically impossible sets are refused with one line naming the field; the measured
 * duty against CoolProp's humid-air functions; the healthy ranges (common practice); the
 * reading's standard uncertainty (GUM 4.3.7).
 */
class MeasurementsTest {

    static Measurements evaporator(double tIn, double tOut, double rh, double v, double tSat, double sh) {
        return new Measurements(Duty.EVAPORATOR, Reading.exact(tIn), Reading.exact(tOut), Reading.exact(rh), null,
                Reading.exact(v), Reading.exact(tSat), Reading.exact(sh), null, 101_325);
    }

    static Measurements condenser(double tIn, double tOut, double v, double tSat, double sc) {
        return new Measurements(Duty.CONDENSER, Reading.exact(tIn), Reading.exact(tOut), null, null, Reading.exact(v),
                Reading.exact(tSat), Reading.exact(sc), null, 101_325);
    }

    static void refused(Runnable r, String field) {
        assertThatThrownBy(r::run).isInstanceOf(InputException.class)
                .satisfies(e -> assertThat(((InputException) e).field()).isEqualTo(field))
                .satisfies(e -> assertThat(e.getMessage()).startsWith(field + ": ").doesNotContain("\n"));
    }

    @Test
    void impossibleEvaporatorReadingsAreRefused() {
        refused(() -> evaporator(275.15, 276.15, 0.8, 1.5, 267.15, 6), "measured.airOutletTemperature");
        refused(() -> evaporator(275.15, 273.15, 0.8, 0, 267.15, 6), "measured.volumeFlow");
        refused(() -> evaporator(275.15, 273.15, 0.8, 1.5, 276.15, 6), "measured.saturationTemperature");
        refused(() -> evaporator(275.15, 266.15, 0.8, 1.5, 267.15, 6), "measured.airOutletTemperature");
        refused(() -> evaporator(275.15, 273.15, 1.2, 1.5, 267.15, 6), "measured.airInletRelativeHumidity");
        refused(() -> evaporator(275.15, 273.15, 0.8, 1.5, 267.15, -1), "measured.superheat");
        refused(() -> new Measurements(Duty.EVAPORATOR, Reading.exact(275.15), Reading.exact(273.15), null, null,
                Reading.exact(1.5), Reading.exact(267.15), Reading.exact(6), null, 101_325),
                "measured.airInletRelativeHumidity");
        // the leaving air cannot hold more water than the entering air
        refused(() -> new Measurements(Duty.EVAPORATOR, Reading.exact(275.15), Reading.exact(273.15),
                Reading.exact(0.5), Reading.exact(1.0), Reading.exact(1.5), Reading.exact(267.15), Reading.exact(6), null,
                101_325), "measured.airOutletRelativeHumidity");
    }

    @Test
    void impossibleCondenserReadingsAreRefused() {
        refused(() -> condenser(305.15, 304.15, 0.8, 318.15, 3), "measured.airOutletTemperature");
        refused(() -> condenser(305.15, 312.15, 0.8, 300.15, 3), "measured.saturationTemperature");
        refused(() -> condenser(305.15, 312.15, -0.8, 318.15, 3), "measured.volumeFlow");
        refused(() -> condenser(305.15, 312.15, 0.8, 318.15, -2), "measured.subcooling");
        assertThatThrownBy(() -> new Reading(1, -0.5)).isInstanceOf(InputException.class).hasMessageStartingWith("accuracy");
    }

    /** Reference: diagnosis_measured_duty.csv (CoolProp HAPropsSI, scripts/diagnosis_measured_duty.py), 0.3 %. */
    @Test
    void measuredDutyMatchesCoolProp() {
        for (double[] row : Reference.csv("/reference/diagnosis_measured_duty.csv")) {
            boolean cooling = row[2] < row[0];
            Measurements m = new Measurements(cooling ? Duty.EVAPORATOR : Duty.CONDENSER, Reading.exact(row[0]),
                    Reading.exact(row[2]), Reading.exact(row[1]), null, Reading.exact(row[3]),
                    Reading.exact(cooling ? row[2] - 5 : row[2] + 8), Reading.exact(3), null, row[4]);
            String ctx = "T_in " + row[0] + " rh " + row[1];
            assertRelative(row[5], MeasuredDuty.dryAirMassFlow(m), 3e-3, ctx + " m_da");
            assertRelative(Math.abs(row[6]), MeasuredDuty.of(m, MeasuredDuty.Basis.SENSIBLE), 3e-3, ctx + " Q");
        }
    }

    /** The Javadoc's worked example, verbatim: 1.5 m3/s, 30 C dry to 40 C. */
    @Test
    void measuredDutyJavadocExample() {
        Measurements m = condenser(303.15, 313.15, 1.5, 321.15, 3);
        assertRelative(1.74665, MeasuredDuty.dryAirMassFlow(m), 1e-5, "m_da");
        assertRelative(17571.3, MeasuredDuty.of(m, MeasuredDuty.Basis.SENSIBLE), 1e-5, "Q");
        assertThat(MeasuredDuty.basis(m)).isEqualTo(MeasuredDuty.Basis.SENSIBLE);
    }

    /** The total duty exceeds the sensible one by the latent heat of the water removed (ASHRAE 2017 Ch. 1 eq. 32). */
    @Test
    void totalDutyAddsTheLatentHeat() {
        Measurements m = new Measurements(Duty.EVAPORATOR, Reading.exact(297.15), Reading.exact(287.15),
                Reading.exact(0.5), Reading.exact(0.9), Reading.exact(1.0), Reading.exact(280.15), Reading.exact(5), null,
                101_325);
        assertThat(MeasuredDuty.basis(m)).isEqualTo(MeasuredDuty.Basis.TOTAL);
        assertThat(MeasuredDuty.of(m, MeasuredDuty.Basis.TOTAL)).isGreaterThan(MeasuredDuty.of(m, MeasuredDuty.Basis.SENSIBLE));
    }

    /** The brief's common-practice ranges: evaporator superheat 4-8 K, condenser air rise 8-15 K. */
    @Test
    void healthyRangesFlagOddReadings() {
        List<HealthyRanges.RangeCheck> evap = HealthyRanges.check(evaporator(275.15, 271.15, 0.8, 1.5, 267.15, 12), 0.75);
        assertThat(evap).extracting(HealthyRanges.RangeCheck::name).contains("air temperature drop", "superheat");
        assertThat(evap.get(0).status()).isEqualTo("typical");
        assertThat(evap.get(1).status()).isEqualTo("high");
        List<HealthyRanges.RangeCheck> cond = HealthyRanges.check(condenser(305.15, 310.15, 0.8, 318.15, 5), 0.366);
        assertThat(cond.get(0).status()).isEqualTo("low");
        assertThat(cond.get(1).status()).isEqualTo("typical");
    }

    /** GUM 4.3.7: a rectangular distribution of half-width a has u = a / sqrt(3). */
    @Test
    void accuracyIsARectangularLimit() {
        assertRelative(0.5 / Math.sqrt(3), new Reading(300, 0.5).standardUncertainty(), 1e-15, "u");
    }
}
