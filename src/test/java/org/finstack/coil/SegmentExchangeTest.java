package org.finstack.coil;

import static org.assertj.core.api.Assertions.assertThat;
import static org.finstack.testing.Reference.assertRelative;

import org.finstack.airside.fin.SchmidtFinEfficiency;
import org.finstack.core.Warnings;
import org.finstack.fluid.psychro.MoistAirState;
import org.finstack.fluid.psychro.Psychrometrics;
import org.finstack.testing.Coils;
import org.junit.jupiter.api.Test;

/**
 * Part-of-coil exchange: the dry result reproduces the isothermal rating (eps = 1 - exp(-NTU),
 * Incropera &amp; DeWitt eq. 11.35); splitting a coil into parts in parallel on the air changes
 * nothing (invariant); the wet result closes the moist-air energy balance and behaves as a
 * practitioner knows (common practice: a cooling coil at 7 C in 27 C / 50 % air removes
 * moisture, its sensible heat ratio lies between about 0.6 and 0.9, and dry air gives a dry coil).
 */
class SegmentExchangeTest {

    private static final double P = 101_325;

    private static CoilSurface surface(double h) {
        return CoilSurface.of(Coils.exampleCondenser(), FoulingResistances.NONE, h, SchmidtFinEfficiency.INSTANCE);
    }

    @Test
    void dryPartReproducesTheIsothermalRatingOfTheWholeCoil() {
        Rating r = new IsothermalCoilModel().rate(IsothermalCoilModelTest.condenser(Coils.exampleCondenser()));
        CoilSurface s = surface(r.airCoefficient());
        double mAir = r.airMassFlow();
        MoistAirState in = new MoistAirState(r.airInletTemperature(), 0, P);
        SegmentExchange.Result x = SegmentExchange.exchange(s, 1, in, mAir, 318.15, Double.POSITIVE_INFINITY, 2500,
                new Warnings());
        // the rating uses cp at the mean air temperature, the part uses the ASHRAE moist-air cp: 0.3 % apart
        assertRelative(r.capacity(), -x.heat(), 0.005, "condenser heat, whole coil as one part");
        assertRelative(r.ua(), x.ua(), 1e-9, "UA");
        assertThat(x.wet()).isFalse();
    }

    @Test
    void partsInParallelOnTheAirAddUp() {
        CoilSurface s = surface(60);
        MoistAirState in = MoistAirState.fromRelativeHumidity(300.15, 0.5, P);
        Warnings w = new Warnings();
        SegmentExchange.Result whole = SegmentExchange.exchange(s, 1, in, 1.0, 280.15, Double.POSITIVE_INFINITY, 2000, w);
        SegmentExchange.Result quarter = SegmentExchange.exchange(s, 0.25, in, 0.25, 280.15, Double.POSITIVE_INFINITY, 2000, w);
        assertRelative(whole.heat(), 4 * quarter.heat(), 1e-9, "four quarters in parallel");
        assertRelative(whole.condensate(), 4 * quarter.condensate(), 1e-9, "condensate");
    }

    @Test
    void wetCoolingCoilClosesItsBalanceAndDehumidifies() {
        CoilSurface s = surface(60);
        MoistAirState in = MoistAirState.fromRelativeHumidity(300.15, 0.5, P);
        double mAir = 1.0;
        SegmentExchange.Result x = SegmentExchange.exchange(s, 1, in, mAir, 280.15, Double.POSITIVE_INFINITY, 2000,
                new Warnings());
        assertThat(x.wet()).isTrue();
        assertRelative(x.heat(), mAir * (in.enthalpy() - x.airOut().enthalpy()), 1e-9, "moist-air energy balance");
        assertThat(x.condensate()).isPositive();
        assertThat(x.airOut().humidityRatio()).isLessThan(in.humidityRatio());
        assertThat(x.airOut().dryBulb()).isBetween(280.15, 300.15);
        double sensible = mAir * (1006 + 1860 * in.humidityRatio()) * (in.dryBulb() - x.airOut().dryBulb());
        assertThat(sensible / x.heat()).isBetween(0.6, 0.9);
        SegmentExchange.Result dryAir = SegmentExchange.exchange(s, 1, new MoistAirState(300.15, 0, P), mAir, 280.15,
                Double.POSITIVE_INFINITY, 2000, new Warnings());
        assertThat(dryAir.wet()).isFalse();
        assertThat(x.heat()).isGreaterThan(dryAir.heat());
        assertThat(x.surfaceTemperature()).isBetween(280.15, in.dewPoint());
    }

    @Test
    void frostBelowFreezing() {
        CoilSurface s = surface(40);
        MoistAirState in = MoistAirState.fromRelativeHumidity(275.15, 0.85, P);
        SegmentExchange.Result x = SegmentExchange.exchange(s, 1, in, 1.0, 263.15, Double.POSITIVE_INFINITY, 1500,
                new Warnings());
        assertThat(x.wet()).isTrue();
        assertThat(x.frost()).isTrue();
        assertThat(x.surfaceTemperature()).isLessThan(Psychrometrics.ZERO_CELSIUS);
    }

    @Test
    void singlePhaseRefrigerantWarmsAlongThePart() {
        CoilSurface s = surface(60);
        MoistAirState in = new MoistAirState(300.15, 0, P);
        SegmentExchange.Result x = SegmentExchange.exchange(s, 0.1, in, 0.1, 280.15, 20, 800, new Warnings());
        double refrigerantRise = x.heat() / 20;
        assertThat(refrigerantRise).isBetween(0.0, 20.0);
        assertThat(x.heat()).isLessThan(20 * 20.0);
    }
}
