package org.finstack.study.diagnosis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.finstack.coil.AirInlet;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Duty;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.Rating;
import org.finstack.coil.RefrigerantSide;
import org.finstack.coil.RefrigerantSide.Model;
import org.finstack.coil.RefrigerantSide.SaturationConvention;
import org.finstack.coil.RefrigerantSide.Target;
import org.finstack.testing.Coils;
import org.junit.jupiter.api.Test;

/**
 * Round trips through the rating model: a coil rated with a known air-side fouling resistance
 * is turned into readings (air in and out from the rating, airflow, saturation temperature,
 * superheat or subcooling) and diagnosed; the fouling, the capacity loss and the clean coil must
 * come back. The reference is the rating model itself at the known fouling (an internal
 * consistency check of the inversion, which must be able to fail if the solve, the duty
 * definition or the readings' mapping were wrong).
 */
class DiagnosisTest {

    static final double R_KNOWN = 0.0008; // m2 K/W, a heavy dust film (chosen for the test)

    /** The example condenser (Coils.exampleCondenser) on R-134a, 3 K subcooling, dry air at 32 C. */
    static CoilCase condenser(double airSide) {
        RefrigerantSide r = new RefrigerantSide("R134a", Duty.CONDENSER, 318.15, SaturationConvention.DEW, 0, 0, 343.15,
                new Target.Subcooling(3), Model.ZONES, 10);
        return new CoilCase(Coils.exampleCondenser(), new AirInlet(305.15, 0, 0.8, 101_325, 0), r,
                new FoulingResistances(airSide, 0, 0));
    }

    static Measurements readings(Rating r, CoilCase c, double accuracy) {
        RefrigerantSide ref = c.refrigerant();
        double held = ref.target() instanceof Target.Subcooling s ? s.kelvin() : ((Target.Superheat) ref.target()).kelvin();
        return new Measurements(ref.duty(), new Reading(r.airInletTemperature(), accuracy),
                new Reading(r.airOutletTemperature(), accuracy), new Reading(c.air().relativeHumidity(), 0), null,
                new Reading(r.airVolumeFlow(), 0), new Reading(ref.saturationTemperature(), accuracy),
                new Reading(held, accuracy), null, c.air().pressure());
    }

    @Test
    void condenserRoundTripRecoversTheFoulingAndTheLoss() {
        CoilCase dirty = condenser(R_KNOWN);
        Rating fouled = CoilModels.rate(dirty);
        Rating cleanRating = CoilModels.rate(condenser(0));
        Diagnosis d = Diagnosis.of(condenser(0), readings(fouled, dirty, 0.3), null);
        assertThat(d.airSideFouling().value()).isCloseTo(R_KNOWN, within(2e-6));
        assertThat(R_KNOWN).isBetween(d.airSideFouling().low(), d.airSideFouling().high());
        double loss = 1 - fouled.capacity() / cleanRating.capacity();
        assertThat(d.capacityLossFraction().value()).isCloseTo(loss, within(1e-3));
        assertThat(loss).isBetween(d.capacityLossFraction().low(), d.capacityLossFraction().high());
        assertThat(d.ua().value()).isCloseTo(fouled.ua(), within(1e-3 * fouled.ua()));
        assertThat(d.cleanUa().value()).isCloseTo(cleanRating.ua(), within(1e-6 * cleanRating.ua()));
        assertThat(d.capacityClean().value()).isCloseTo(cleanRating.capacity(), within(1e-6 * cleanRating.capacity()));
        assertThat(d.foulingLevel().value()).isPositive();
        assertThat(d.airSideFouling().standardUncertainty()).isPositive();
        System.out.println(d.airSideFouling() + " " + d.foulingBudget() + " " + d.capacityLossFraction() + " " + d.foulingLevel());
    }
}
