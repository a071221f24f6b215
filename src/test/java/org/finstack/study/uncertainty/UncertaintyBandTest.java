package org.finstack.study.uncertainty;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import org.finstack.coil.AirInlet;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.CorrelationFactors;
import org.finstack.coil.Duty;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.RefrigerantSide;
import org.finstack.coil.RefrigerantSide.Model;
import org.finstack.coil.RefrigerantSide.SaturationConvention;
import org.finstack.coil.RefrigerantSide.Target;
import org.finstack.core.InputException;
import org.finstack.testing.Coils;
import org.junit.jupiter.api.Test;

/**
 * The Monte Carlo band: reproducible with a seed, wider with larger input tolerances and a
 * larger correlation scatter (the same draws), bracketing the nominal rating, collapsing onto it
 * with no scatter, and its percentile rule (Hyndman &amp; Fan 1996,
 * definition 7, NumPy's default). Small coil, mostly the isothermal model, and few samples keep it fast.
 */
class UncertaintyBandTest {

    /** The example condenser rated isothermally (version-1 case), 32 C air at 2.2 m/s, 45 C condensing. */
    static CoilCase condenser() {
        return new CoilCase(Coils.exampleCondenser(), new AirInlet(305.15, 2.2, 0, 101_325, 0),
                new RefrigerantSide("R134a", Duty.CONDENSER, 318.15, 2500), FoulingResistances.NONE);
    }

    @Test
    void sameSeedSameBand() {
        UncertaintyBand a = UncertaintyBand.of(condenser(), 12, 42);
        UncertaintyBand b = UncertaintyBand.of(condenser(), 12, 42);
        assertThat(a).isEqualTo(b);
        UncertaintyBand c = UncertaintyBand.of(condenser(), 12, 43);
        assertThat(c.capacityP10()).isNotEqualTo(a.capacityP10());
    }

    @Test
    void bandWidensWithInputTolerance() {
        InputTolerances t = new InputTolerances(0.5, 0, 0.05, 0.5, 0);
        UncertaintyBand none = UncertaintyBand.of(condenser(), 16, 7);
        UncertaintyBand some = UncertaintyBand.of(condenser(), t, 16, 7);
        UncertaintyBand more = UncertaintyBand.of(condenser(), t.scaled(3), 16, 7);
        assertThat(some.capacityRelativeWidth()).isGreaterThan(none.capacityRelativeWidth());
        assertThat(more.capacityRelativeWidth()).isGreaterThan(some.capacityRelativeWidth());
        assertThat(more.pressureDropP90() - more.pressureDropP10())
                .isGreaterThan(none.pressureDropP90() - none.pressureDropP10());
    }

    /**
     * With the correlation's scatter alone the band brackets the nominal rating, and its width
     * follows from sigma_j: the published 88.6 % within ±15 % (Wang, Chi &amp; Chang 2000) gives
     * sigma 9.49 %; a coil whose capacity elasticity to j is e (measured here through the
     * correlation factors, j x 1.05) has a capacity band about 2 x 1.2816 x e x sigma_j wide
     * (checked loosely: 16 samples).
     */
    @Test
    void correlationScatterAloneBracketsTheNominal() {
        CoilCase c = condenser();
        UncertaintyBand b = UncertaintyBand.of(c, 16, 3);
        assertThat(b.capacityP10()).isLessThan(b.nominalCapacity());
        assertThat(b.capacityP90()).isGreaterThan(b.nominalCapacity());
        assertThat(b.pressureDropP10()).isLessThan(b.nominalPressureDrop());
        assertThat(b.pressureDropP90()).isGreaterThan(b.nominalPressureDrop());
        assertRelative(0.0949087, b.sigmaJ(), 1e-6, "sigma_j from 88.6 % within 15 %");
        double e = Math.log(CoilModels.rate(c.withFactors(new CorrelationFactors(1.05, 1))).capacity()
                / b.nominalCapacity()) / Math.log(1.05);
        assertThat(e).isBetween(0.1, 1.0);
        double expected = 2 * 1.2816 * e * b.sigmaJ();
        assertThat(b.capacityRelativeWidth()).isBetween(0.5 * expected, 1.5 * expected);
        assertThat(b.failedSamples()).isZero();
    }

    /** Zero scatter and exact inputs: every sample is the nominal rating (factors 1 reproduce it exactly). */
    @Test
    void zeroScatterCollapsesTheBandOntoTheNominal() {
        UncertaintyBand b = UncertaintyBand.of(condenser(), InputTolerances.NONE, 0, 0, 5, 11);
        assertThat(b.capacityP10()).isEqualTo(b.nominalCapacity());
        assertThat(b.capacityP90()).isEqualTo(b.nominalCapacity());
        assertThat(b.pressureDropP10()).isEqualTo(b.nominalPressureDrop());
        assertThat(b.pressureDropP90()).isEqualTo(b.nominalPressureDrop());
    }

    /** The same draws with a larger sigma: the capacity band widens with sigma_j, the pressure-drop band with sigma_f. */
    @Test
    void bandWidensWithTheCorrelationSigma() {
        CoilCase c = condenser();
        UncertaintyBand small = UncertaintyBand.of(c, InputTolerances.NONE, 0.05, 0.05, 16, 5);
        UncertaintyBand mid = UncertaintyBand.of(c, InputTolerances.NONE, 0.10, 0.10, 16, 5);
        UncertaintyBand large = UncertaintyBand.of(c, InputTolerances.NONE, 0.20, 0.20, 16, 5);
        assertThat(mid.capacityRelativeWidth()).isGreaterThan(small.capacityRelativeWidth());
        assertThat(large.capacityRelativeWidth()).isGreaterThan(mid.capacityRelativeWidth());
        assertThat(mid.pressureDropP90() - mid.pressureDropP10())
                .isGreaterThan(small.pressureDropP90() - small.pressureDropP10());
        assertThat(large.pressureDropP90() - large.pressureDropP10())
                .isGreaterThan(mid.pressureDropP90() - mid.pressureDropP10());
        // only j moves the capacity: an f-only band has no capacity width
        UncertaintyBand fOnly = UncertaintyBand.of(c, InputTolerances.NONE, 0, 0.2, 8, 5);
        assertThat(fOnly.capacityP90()).isEqualTo(fOnly.capacityP10());
        assertThat(fOnly.pressureDropP90()).isGreaterThan(fOnly.pressureDropP10());
    }

    /** The zone model with a wet evaporator: the band brackets the nominal rating too. */
    @Test
    void zoneModelBandBracketsTheNominal() {
        RefrigerantSide r = new RefrigerantSide("R134a", Duty.EVAPORATOR, 267.15, SaturationConvention.DEW, 0, 303.15, 0,
                new Target.Superheat(6), Model.ZONES, 10);
        CoilCase c = new CoilCase(Coils.exampleCondenser(), new AirInlet(275.15, 0, 0.8, 101_325, 0.85), r,
                FoulingResistances.NONE);
        UncertaintyBand b = UncertaintyBand.of(c, 12, 9);
        assertThat(b.capacityP10()).isLessThan(b.nominalCapacity());
        assertThat(b.capacityP90()).isGreaterThan(b.nominalCapacity());
        assertThat(b.failedSamples()).isZero();
    }

    /** NumPy's default percentile (linear, definition 7): np.percentile([1, 2, 4, 8], 10) = 1.3, 50 -> 3.0, 90 -> 6.8. */
    @Test
    void percentileIsDefinitionSeven() {
        double[] x = {1, 2, 4, 8};
        assertRelative(1.3, UncertaintyBand.percentile(x, 0.1), 1e-12, "p10");
        assertRelative(3.0, UncertaintyBand.percentile(x, 0.5), 1e-12, "p50");
        assertRelative(6.8, UncertaintyBand.percentile(x, 0.9), 1e-12, "p90");
        assertRelative(8, UncertaintyBand.percentile(x, 1), 1e-12, "p100");
    }

    @Test
    void refusesTooFewSamplesAndARequiredCapacity() {
        assertThatThrownBy(() -> UncertaintyBand.of(condenser(), 2, 1)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("samples");
        assertThatThrownBy(() -> new InputTolerances(-1, 0, 0, 0, 0)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("airTemperature");
        assertThatThrownBy(() -> UncertaintyBand.of(condenser(), InputTolerances.NONE, -0.1, 0, 5, 1))
                .isInstanceOf(InputException.class).hasMessageStartingWith("sigmaJ");
    }

    @Test
    void timingHarnessReportsRatingsPerSecond() {
        UncertaintyBand.Timing t = UncertaintyBand.time(condenser(), 5, 1);
        assertThat(t.seconds()).isPositive();
        assertThat(t.ratingsPerSecond()).isPositive();
        assertThat(t.band().samples()).isEqualTo(5);
    }
}
