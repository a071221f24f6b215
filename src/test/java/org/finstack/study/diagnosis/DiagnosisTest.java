package org.finstack.study.diagnosis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.finstack.testing.Reference.assertRelative;

import java.util.concurrent.CancellationException;
import org.finstack.airside.WangChiChang2000PlainFin;
import org.finstack.coil.AirInlet;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.CorrelationFactors;
import org.finstack.coil.Duty;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.Rating;
import org.finstack.coil.RefrigerantSide;
import org.finstack.coil.RefrigerantSide.Model;
import org.finstack.coil.RefrigerantSide.SaturationConvention;
import org.finstack.coil.RefrigerantSide.Target;
import org.finstack.core.InputException;
import org.finstack.study.cost.CleaningPayback;
import org.finstack.study.uncertainty.NormalCoverage;
import org.finstack.testing.Coils;
import org.finstack.testing.Stopper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Round trips through the rating model: a coil rated with a known air-side fouling resistance
 * is turned into readings (air in and out from the rating, airflow, saturation temperature,
 * superheat or subcooling) and diagnosed; the fouling, the capacity loss and the clean coil must
 * come back. The reference is the rating model at the known fouling: a consistency check of the
 * inversion (solve, duty definition, mapping of readings), which fails if any of them is wrong.
 * The payback is checked against the published formulas worked by hand in the test (Carnot COP,
 * Stoecker &amp; Jones 1982; the saturation shift dT f / (1 - f)).
 */
class DiagnosisTest {

    static final double R_KNOWN = 0.0008; // m2 K/W, a heavy dust film (chosen for the test)

    static final CleaningInputs CLEANING = new CleaningInputs(250, "EUR", 0.20, 3000, 0.5, 268.15);

    static Rating fouled;
    static Rating cleanRating;
    static Diagnosis diagnosis;

    /** The example condenser (Coils.exampleCondenser) on R-134a, 3 K subcooling, dry air at 32 C. */
    static CoilCase condenser(double airSide) {
        RefrigerantSide r = new RefrigerantSide("R134a", Duty.CONDENSER, 318.15, SaturationConvention.DEW, 0, 0, 343.15,
                new Target.Subcooling(3), Model.ZONES, 10);
        return new CoilCase(Coils.exampleCondenser(), new AirInlet(305.15, 0, 0.8, 101_325, 0), r,
                new FoulingResistances(airSide, 0, 0));
    }

    /** A 3-row version of the same coil as a +2 C cooler's evaporator, R-134a, 85 % RH, 6 K superheat. */
    static CoilCase evaporator(double airSide) {
        RefrigerantSide r = new RefrigerantSide("R134a", Duty.EVAPORATOR, 267.15, SaturationConvention.DEW, 0, 303.15, 0,
                new Target.Superheat(6), Model.ZONES, 10);
        return new CoilCase(Coils.exampleCondenser(), new AirInlet(275.15, 0, 0.8, 101_325, 0.85), r,
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

    @BeforeAll
    static void diagnoseTheFouledCondenser() {
        CoilCase dirty = condenser(R_KNOWN);
        fouled = CoilModels.rate(dirty);
        cleanRating = CoilModels.rate(condenser(0));
        diagnosis = Diagnosis.of(condenser(0), readings(fouled, dirty, 0.3), CLEANING);
    }

    @Test
    void condenserRoundTripRecoversTheFoulingAndTheLoss() {
        Diagnosis d = diagnosis;
        assertThat(d.airSideFouling().value()).isCloseTo(R_KNOWN, within(2e-6));
        assertThat(R_KNOWN).isBetween(d.airSideFouling().low(), d.airSideFouling().high());
        double loss = 1 - fouled.capacity() / cleanRating.capacity();
        assertThat(loss).isPositive();
        assertThat(d.capacityLossFraction().value()).isCloseTo(loss, within(1e-3));
        assertThat(loss).isBetween(d.capacityLossFraction().low(), d.capacityLossFraction().high());
        assertRelative(fouled.ua(), d.ua().value(), 1e-3, "present UA");
        assertRelative(fouled.capacity(), d.capacityNow().value(), 1e-3, "present capacity");
        assertRelative(cleanRating.ua(), d.cleanUa().value(), 1e-9, "clean UA");
        assertRelative(cleanRating.capacity(), d.capacityClean().value(), 1e-9, "clean capacity");
        // level = R_f/(eta_o A_o) x UA_clean (the definition)
        double perArea = fouled.resistances().airFouling() / R_KNOWN;
        assertRelative(R_KNOWN * perArea * cleanRating.ua(), d.foulingLevel().value(), 3e-3, "fouling level");
        assertThat(d.basis()).isEqualTo(MeasuredDuty.Basis.SENSIBLE);
    }

    /** The readings' accuracies add to the correlation's scatter: u(R_f) exceeds the j term alone. */
    @Test
    void statedAccuraciesWidenTheRange() {
        Diagnosis d = diagnosis;
        double jOnly = d.foulingBudget().get("airSideCorrelation.j");
        assertThat(jOnly).isPositive();
        assertThat(d.airSideFouling().standardUncertainty()).isGreaterThan(jOnly);
        assertThat(d.foulingBudget()).containsKeys("airInletTemperature", "airOutletTemperature", "saturationTemperature",
                "subcooling");
        assertThat(d.ua().low()).isLessThan(d.ua().value());
        assertThat(d.ua().high()).isGreaterThan(d.ua().value());
    }

    /**
     * The budget's j term is the diagnosis done again with j x (1 + sigma_j) on the template
     * (sigma_j from Wang, Chi &amp; Chang 2000's 88.6 % within ±15 %): a better air film leaves more
     * of the shortfall to the dirt, and a template's own correlation factors are honoured.
     */
    @Test
    void jScatterTermIsTheDiagnosisWithTheRaisedJ() {
        double sigmaJ = NormalCoverage.sigma(WangChiChang2000PlainFin.SCATTER_J, WangChiChang2000PlainFin.SCATTER_BAND);
        Diagnosis raised = Diagnosis.of(condenser(0).withFactors(new CorrelationFactors(1 + sigmaJ, 1)),
                readings(fouled, condenser(R_KNOWN), 0), null);
        assertThat(raised.airSideFouling().value()).isGreaterThan(diagnosis.airSideFouling().value());
        assertRelative(raised.airSideFouling().value() - diagnosis.airSideFouling().value(),
                diagnosis.foulingBudget().get("airSideCorrelation.j"), 1e-6, "j term of the R_f budget");
        assertRelative(diagnosis.ua().value(), raised.ua().value(), 0.02, "present UA barely moves with j");
    }

    /** A fouling just below the search bound is diagnosed (the derivative steps down, not out of the range). */
    @Test
    void foulingNearTheSearchBoundIsDiagnosed() {
        CoilCase dirty = condenser(0.0998);
        Diagnosis d = Diagnosis.of(condenser(0), readings(CoilModels.rate(dirty), dirty, 0), null);
        assertThat(d.airSideFouling().value()).isCloseTo(0.0998, within(1e-5));
        assertThat(d.airSideFouling().high()).isGreaterThan(d.airSideFouling().value());
    }

    /**
     * Payback by hand: f = 1 - UA/UA_clean, dT = Q_s,clean/UA_clean, shift = dT f/(1 - f);
     * COP = eta T_e/(T_c - T_e) (Carnot, Stoecker &amp; Jones 1982); the refrigerating duty is the
     * heat rejected times COP/(1 + COP); W = Q/COP; energy = (W_dirty - W_clean) x 3000 h.
     */
    @Test
    void paybackAgreesWithTheFormulasWorkedByHand() {
        Diagnosis d = diagnosis;
        CleaningPayback p = d.payback().orElseThrow();
        double f = 1 - d.ua().value() / d.cleanUa().value();
        double dT = d.clean().moisture().sensibleCapacity() / d.cleanUa().value();
        double shift = dT * f / (1 - f);
        double te = 268.15;
        double tcDirty = 318.15;
        double tcClean = tcDirty - shift;
        double copClean = 0.5 * te / (tcClean - te);
        double copDirty = 0.5 * te / (tcDirty - te);
        double duty = d.capacityNow().value() * copClean / (1 + copClean);
        double extraW = duty / copDirty - duty / copClean;
        double kwh = extraW * 3000 / 1000;
        assertRelative(shift, p.cleaningCase().saturationShift(), 1e-9, "shift");
        assertRelative(kwh * 3.6e6, p.extraEnergyPerYear(), 1e-9, "extra energy");
        assertRelative(kwh * 0.20, p.costPerYear(), 1e-9, "cost");
        assertRelative(250 / (kwh * 0.20), p.paybackYears().getAsDouble(), 1e-9, "payback");
        assertThat(p.summary()).startsWith("Cleaning this condenser would save about");
    }

    @Test
    void cleanCoilShowsNoLoss() {
        Diagnosis d = Diagnosis.of(condenser(0), readings(cleanRating, condenser(0), 0), null);
        assertThat(d.airSideFouling().value()).isLessThan(2e-6);
        assertThat(d.capacityLossFraction().value()).isCloseTo(0, within(1e-3));
        assertThat(d.foulingLevel().value()).isCloseTo(0, within(1e-3));
        assertRelative(cleanRating.ua(), d.ua().value(), 1e-3, "UA");
        assertThat(d.payback()).isEmpty();
    }

    /** A wet evaporator, leaving humidity not measured: the sensible duty is matched and the fouling recovered. */
    @Test
    void wetEvaporatorRoundTrip() {
        double r = 0.0015;
        CoilCase dirty = evaporator(r);
        Rating rated = CoilModels.rate(dirty);
        assertThat(rated.moisture().latentCapacity()).isPositive();
        Diagnosis d = Diagnosis.of(evaporator(0), readings(rated, dirty, 0), null);
        assertThat(d.basis()).isEqualTo(MeasuredDuty.Basis.SENSIBLE);
        assertThat(d.airSideFouling().value()).isCloseTo(r, within(2e-5));
        assertRelative(rated.capacity(), d.capacityNow().value(), 2e-3, "total capacity now");
        assertThat(d.capacityLossFraction().value()).isPositive();
    }

    @Test
    void aDutyNoFoulingCanExplainIsRefused() {
        Rating r = cleanRating;
        Measurements m = new Measurements(Duty.CONDENSER, Reading.exact(r.airInletTemperature()),
                Reading.exact(r.airInletTemperature() + 0.05), null, null, Reading.exact(r.airVolumeFlow()),
                Reading.exact(318.15), Reading.exact(3), null, 101_325);
        assertThatThrownBy(() -> Diagnosis.of(condenser(0), m, null)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("measured.airOutletTemperature: the measured duty");
    }

    @Test
    void aTemplateWithAirSideFoulingIsRefused() {
        assertThatThrownBy(() -> Diagnosis.of(condenser(0.0002), readings(fouled, condenser(0), 0), null))
                .isInstanceOf(InputException.class).hasMessageStartingWith("fouling.airSide");
    }

    @Test
    void progressHearsEveryStageAndCancelStopsTheDiagnosis() {
        Stopper all = new Stopper(Integer.MAX_VALUE);
        Diagnosis d = Diagnosis.of(condenser(0), readings(fouled, condenser(0), 0.3), null, all);
        assertThat(all.done()).containsExactly(1, 2, 3, 4, 5, 6, 7, 8, 9);
        assertThat(d.airSideFouling()).isEqualTo(Diagnosis.of(condenser(0), readings(fouled, condenser(0), 0.3), null)
                .airSideFouling());
        Stopper one = new Stopper(1);
        assertThatThrownBy(() -> Diagnosis.of(condenser(0), readings(fouled, condenser(0), 0.3), null, one))
                .isInstanceOf(CancellationException.class);
        assertThat(one.done()).containsExactly(1);
    }
}
