package org.finstack.study.diagnosis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.finstack.testing.Reference.assertRelative;

import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Rating;
import org.finstack.core.InputException;
import org.finstack.study.fouling.DepositLayer;
import org.finstack.study.fouling.FoulingLevel;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Round trip through the fouling study's deposit model: the example condenser
 * ({@link DiagnosisTest#condenser}) is given a known dust layer ({@link FoulingLevel}); its
 * thermal case (clean coil plus delta / k) gives the air temperatures, its hydraulic case
 * (passages narrowed by the layer) the air pressure drop; the readings are diagnosed and the
 * layer, its blockage and the capacity loss must come back within the stated ranges. The
 * reference is the deposit model itself at the known layer: a consistency check of the two
 * inversions (duty and pressure drop), which fails if either is wrong.
 */
class DiagnosisDepositLevelTest {

    /** A moderate dust layer on the 2.1 mm-pitch fins (chosen for the test) [m]. */
    static final double DELTA = 0.08e-3;

    static CoilCase clean;
    static FoulingLevel.FoulingCase dirty;
    static Rating thermal;
    static Rating hydraulic;
    static Rating cleanRating;
    static Measurements readings;
    static Diagnosis diagnosis;

    @BeforeAll
    static void diagnoseAKnownLayer() {
        clean = DiagnosisTest.condenser(0);
        dirty = FoulingLevel.dust(DELTA).applyTo(clean);
        thermal = CoilModels.rate(dirty.thermal());
        hydraulic = CoilModels.rate(dirty.hydraulic());
        cleanRating = CoilModels.rate(clean);
        readings = DiagnosisTest.readings(thermal, dirty.thermal(), 0.3)
                .withAirPressureDrop(new Reading(hydraulic.airPressureDrop(), 2.0));
        diagnosis = Diagnosis.of(clean, readings, null);
    }

    @Test
    void depositFromTheDutyComesBackWithItsBlockageAndTheLoss() {
        DepositLevel level = diagnosis.depositLevel();
        Estimate t = level.thickness();
        assertRelative(DELTA, t.value(), 5e-3, "deposit thickness from the duty");
        assertThat(DELTA).isBetween(t.low(), t.high());
        assertThat(level.conductivity()).isEqualTo(FoulingLevel.DUST_CONDUCTIVITY);
        Estimate blocked = level.blockedFraction().orElseThrow();
        assertRelative(dirty.blockedFraction(), blocked.value(), 5e-3, "blocked fraction");
        assertThat(dirty.blockedFraction()).isBetween(blocked.low(), blocked.high());
        double loss = 1 - thermal.capacity() / cleanRating.capacity();
        assertThat(loss).isPositive();
        assertThat(diagnosis.capacityLossFraction().value()).isCloseTo(loss, within(1e-3));
        assertThat(loss).isBetween(diagnosis.capacityLossFraction().low(), diagnosis.capacityLossFraction().high());
    }

    /** The layer found, put back into the fouling study's thermal case, delivers the measured duty. */
    @Test
    void theFoundLayerDeliversTheMeasuredDuty() {
        double found = diagnosis.depositLevel().thickness().value();
        Rating r = CoilModels.rate(FoulingLevel.dust(found).applyTo(readings.applyTo(clean)).thermal());
        assertRelative(diagnosis.measuredDuty().value(), r.moisture().sensibleCapacity(), 1e-3, "duty at the found layer");
    }

    @Test
    void depositFromThePressureDropComesBack() {
        DepositLevel level = diagnosis.depositLevelFromPressureDrop().orElseThrow();
        Estimate t = level.thickness();
        assertRelative(DELTA, t.value(), 1e-4, "deposit thickness from the pressure drop");
        assertThat(DELTA).isBetween(t.low(), t.high());
        assertThat(t.low()).isLessThan(t.value());
        assertThat(t.high()).isGreaterThan(t.value());
        assertRelative(dirty.blockedFraction(), level.blockedFraction().orElseThrow().value(), 1e-3, "blocked fraction");
        assertThat(diagnosis.warnings()).noneMatch(w -> w.contains("disagree"));
    }

    /** A finer manometer narrows the pressure-drop level's range (the reading is one of its inputs). */
    @Test
    void aFinerManometerNarrowsThePressureDropRange() {
        Diagnosis fine = Diagnosis.of(clean, readings.withAirPressureDrop(new Reading(hydraulic.airPressureDrop(), 0.2)),
                null);
        double wide = diagnosis.depositLevelFromPressureDrop().orElseThrow().thickness().standardUncertainty();
        double narrow = fine.depositLevelFromPressureDrop().orElseThrow().thickness().standardUncertainty();
        assertThat(narrow).isPositive().isLessThan(wide);
    }

    @Test
    void withoutAPressureDropReadingThereIsNoSecondLevel() {
        Diagnosis d = Diagnosis.of(clean, readings.withAirPressureDrop(null), null);
        assertThat(d.depositLevelFromPressureDrop()).isEmpty();
        assertRelative(diagnosis.depositLevel().thickness().value(), d.depositLevel().thickness().value(), 1e-9,
                "the duty's level does not depend on the pressure-drop reading");
    }

    @Test
    void aPressureDropAtOrBelowTheCleanCoilsGivesNoLayerAndSaysSo() {
        Diagnosis d = Diagnosis.of(clean,
                readings.withAirPressureDrop(Reading.exact(0.9 * cleanRating.airPressureDrop())), null);
        DepositLevel level = d.depositLevelFromPressureDrop().orElseThrow();
        assertThat(level.thickness().value()).isZero();
        assertThat(level.thickness().low()).isZero();
        assertThat(d.warnings()).anyMatch(w -> w.contains("is not above the clean coil's model value"));
    }

    /** A pressure drop of a 0.5 mm layer beside the duty of a 0.08 mm one: the ranges part, and the diagnosis says so. */
    @Test
    void levelsThatDisagreeBeyondTheirRangesAreReported() {
        double dp = CoilModels.rate(FoulingLevel.dust(0.5e-3).applyTo(clean).hydraulic()).airPressureDrop();
        Diagnosis d = Diagnosis.of(clean, readings.withAirPressureDrop(new Reading(dp, 2.0)), null);
        assertRelative(0.5e-3, d.depositLevelFromPressureDrop().orElseThrow().thickness().value(), 1e-4,
                "the pressure drop's layer");
        assertThat(d.depositLevel().thickness().high())
                .isLessThan(d.depositLevelFromPressureDrop().orElseThrow().thickness().low());
        assertThat(d.warnings()).anyMatch(w -> w.contains("disagree") && w.contains("the pressure drop rose more"));
    }

    @Test
    void aPressureDropNoLayerCanGiveIsRefusedNamingTheField() {
        double max = DepositLayer.maxThickness(clean.coil());
        double top = CoilModels.rate(FoulingLevel.dust(max).applyTo(clean).hydraulic()).airPressureDrop();
        Measurements m = readings.withAirPressureDrop(Reading.exact(1.5 * top));
        assertThatThrownBy(() -> Diagnosis.of(clean, m, null)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("measured.airPressureDrop: is ");
        assertThatThrownBy(() -> readings.withAirPressureDrop(Reading.exact(-5))).isInstanceOf(InputException.class)
                .hasMessageStartingWith("measured.airPressureDrop");
    }

    /** DepositLayer's limit: a layer beyond the thickest the passages hold has no blocked fraction. */
    @Test
    void aLayerBeyondThePassagesHasNoBlockedFraction() {
        double max = DepositLayer.maxThickness(clean.coil());
        DepositLevel beyond = DepositLevel.of(clean.coil(), Estimate.of(1.5 * max, 0.1 * max, true), 0.1);
        assertThat(beyond.beyondModel()).isTrue();
        assertThat(beyond.maxThickness()).isEqualTo(max);
        DepositLevel inside = DepositLevel.of(clean.coil(), Estimate.of(0.5 * max, 0.8 * max, true), 0.1);
        Estimate b = inside.blockedFraction().orElseThrow();
        assertThat(b.low()).isZero();
        assertRelative(DepositLayer.blockedFraction(clean.coil(), max), b.high(), 1e-12, "upper end held at the thickest layer");
        assertThat(b.value()).isBetween(b.low(), b.high());
    }
}
