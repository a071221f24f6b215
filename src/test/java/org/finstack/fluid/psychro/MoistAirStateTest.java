package org.finstack.fluid.psychro;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.assertj.core.api.ThrowableAssert.ThrowingCallable;
import org.assertj.core.data.Offset;
import org.finstack.core.InputException;
import org.finstack.core.OutOfRangeException;
import org.junit.jupiter.api.Test;

/** Checks of the moist-air state: worked example, round trips, invariants and refusals. */
class MoistAirStateTest {

    private static final double P0 = 101325;

    /**
     * The worked example of the MoistAirState Javadoc; the same point is a row of the PsychroLib
     * 1.1.1 reference CSV (W 0.011895049, h 55452.636 J/kg, dew point 289.85113 K, wet bulb
     * 292.62105 K, density 1.1755582 kg/m3).
     */
    @Test
    void workedExample() {
        MoistAirState s = MoistAirState.fromRelativeHumidity(298.15, 0.6, P0);
        assertRelative(0.0118950, s.humidityRatio(), 1e-5, "W");
        assertRelative(55452.6, s.enthalpy(), 1e-6, "h");
        assertThat(s.dewPoint()).isCloseTo(289.851, Offset.offset(5e-4));
        assertThat(s.wetBulb()).isCloseTo(292.621, Offset.offset(5e-4));
        assertRelative(1.17556, s.density(), 1e-5, "rho");
        assertRelative(0.860778, s.specificVolume(), 1e-6, "v");
        assertRelative(0.6, s.relativeHumidity(), 1e-12, "RH");
        assertRelative(0.6 * 3169.2164701436277, s.vapourPressure(), 1e-9, "p_w (PsychroLib p_ws at 25 C)");
    }

    @Property(tries = 300)
    void relativeHumidityRoundTrip(@ForAll @DoubleRange(min = 213.15, max = 353.15) double t,
            @ForAll @DoubleRange(min = 0, max = 1) double rh,
            @ForAll @DoubleRange(min = 60000, max = 110000) double p) {
        MoistAirState s = MoistAirState.fromRelativeHumidity(t, rh, p);
        assertThat(s.relativeHumidity()).isCloseTo(rh, Offset.offset(1e-12));
    }

    @Property(tries = 300)
    void wetBulbRoundTrip(@ForAll @DoubleRange(min = 213.15, max = 353.15) double t,
            @ForAll @DoubleRange(min = 0.02, max = 1) double rh,
            @ForAll @DoubleRange(min = 60000, max = 110000) double p) {
        double twb = MoistAirState.fromRelativeHumidity(t, rh, p).wetBulb();
        MoistAirState s = MoistAirState.fromWetBulb(t, twb, p);
        if (Math.abs(twb - Psychrometrics.ZERO_CELSIUS) > 1e-6) {
            // away from the eq. 35/33 switch at 0 C, where W(T*) steps
            assertThat(s.relativeHumidity()).isCloseTo(rh, Offset.offset(1e-7));
        }
        assertThat(s.wetBulb()).isCloseTo(twb, Offset.offset(1e-7));
    }

    @Property(tries = 300)
    void dewPointRoundTrip(@ForAll @DoubleRange(min = 213.15, max = 353.15) double t,
            @ForAll @DoubleRange(min = 0.02, max = 1) double rh,
            @ForAll @DoubleRange(min = 60000, max = 110000) double p) {
        MoistAirState s = MoistAirState.fromRelativeHumidity(t, rh, p);
        MoistAirState back = MoistAirState.fromDewPoint(t, s.dewPoint(), p);
        assertRelative(s.humidityRatio(), back.humidityRatio(), 1e-9, "W via dew point");
    }

    @Property(tries = 300)
    void enthalpyRoundTrip(@ForAll @DoubleRange(min = 213.15, max = 353.15) double t,
            @ForAll @DoubleRange(min = 0, max = 1) double rh,
            @ForAll @DoubleRange(min = 60000, max = 110000) double p) {
        MoistAirState s = MoistAirState.fromRelativeHumidity(t, rh, p);
        MoistAirState back = MoistAirState.fromEnthalpy(s.enthalpy(), s.humidityRatio(), p);
        assertThat(back.dryBulb()).isCloseTo(t, Offset.offset(1e-9));
    }

    /** Invariant: dew point &le; wet bulb &le; dry bulb for any state. */
    @Property(tries = 300)
    void dewPointNotAboveWetBulbNotAboveDryBulb(@ForAll @DoubleRange(min = 213.15, max = 353.15) double t,
            @ForAll @DoubleRange(min = 0.01, max = 1) double rh,
            @ForAll @DoubleRange(min = 60000, max = 110000) double p) {
        MoistAirState s = MoistAirState.fromRelativeHumidity(t, rh, p);
        assertThat(s.dewPoint()).isLessThanOrEqualTo(s.wetBulb() + 1e-9);
        assertThat(s.wetBulb()).isLessThanOrEqualTo(t);
    }

    /** Invariant: saturated air (RH = 1) has dew point = wet bulb = dry bulb, over ice and over water. */
    @Test
    void saturatedAirHasEqualTemperatures() {
        for (double t : new double[] {233.15, 263.15, 273.15, 273.16, 283.15, 303.15, 333.15}) {
            MoistAirState s = MoistAirState.fromRelativeHumidity(t, 1, P0);
            assertThat(s.dewPoint()).as("dew point at %s K", t).isCloseTo(t, Offset.offset(1e-8));
            assertThat(s.wetBulb()).as("wet bulb at %s K", t).isCloseTo(t, Offset.offset(1e-8));
            assertThat(s.relativeHumidity()).isEqualTo(1.0, Offset.offset(1e-12));
            assertRelative(s.saturationHumidityRatio(), s.humidityRatio(), 1e-12, "W = W_s");
        }
    }

    /** Invariant: moist air is lighter than dry air at the same temperature and pressure. */
    @Test
    void moistAirLighterThanDryAir() {
        double dry = new MoistAirState(303.15, 0, P0).density();
        double previous = dry;
        for (double rh = 0.1; rh <= 1; rh += 0.1) {
            double rho = MoistAirState.fromRelativeHumidity(303.15, rh, P0).density();
            assertThat(rho).isLessThan(previous);
            previous = rho;
        }
    }

    @Test
    void refusesSupersaturatedAir() {
        double ws = Psychrometrics.saturationHumidityRatio(293.15, P0);
        assertThatThrownBy(() -> new MoistAirState(293.15, ws * 1.001, P0))
                .isInstanceOf(InputException.class)
                .hasMessageContaining("supersaturated")
                .satisfies(e -> assertThat(((InputException) e).field()).isEqualTo("humidityRatio"));
    }

    @Test
    void rejectsInvalidInputNamingTheField() {
        assertField(() -> MoistAirState.fromRelativeHumidity(293.15, 1.2, P0), "relativeHumidity");
        assertField(() -> new MoistAirState(293.15, -0.001, P0), "humidityRatio");
        assertField(() -> new MoistAirState(293.15, 0.001, 0), "pressure");
        assertField(() -> new MoistAirState(Double.NaN, 0.001, P0), "dryBulb");
        assertField(() -> MoistAirState.fromWetBulb(293.15, 295, P0), "wetBulb");
        assertField(() -> MoistAirState.fromDewPoint(293.15, 295, P0), "dewPoint");
    }

    @Test
    void refusesTemperaturesOutsideTheFormulation() {
        assertThatThrownBy(() -> new MoistAirState(480, 0.001, P0)).isInstanceOf(OutOfRangeException.class);
        assertThatThrownBy(() -> new MoistAirState(300, 0, P0).dewPoint()).isInstanceOf(OutOfRangeException.class);
        assertThatThrownBy(() -> MoistAirState.fromEnthalpy(-200_000, 0, P0)).isInstanceOf(OutOfRangeException.class);
    }

    private static void assertField(ThrowingCallable call, String field) {
        assertThatThrownBy(call).isInstanceOf(InputException.class)
                .satisfies(e -> assertThat(((InputException) e).field()).isEqualTo(field));
    }
}
