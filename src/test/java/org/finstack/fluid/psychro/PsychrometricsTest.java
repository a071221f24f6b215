package org.finstack.fluid.psychro;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import java.util.List;
import org.assertj.core.api.ThrowableAssert.ThrowingCallable;
import org.assertj.core.data.Offset;
import org.finstack.core.InputException;
import org.finstack.core.OutOfRangeException;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** Checks of the ASHRAE 2017 Ch. 1 relations against the handbook's tables and against PsychroLib. */
class PsychrometricsTest {

    private static final double K = 273.15;
    private static final double P0 = 101325;

    // columns of /reference/psychro_psychrolib.csv
    private static final int T = 0;
    private static final int RH = 1;
    private static final int P = 2;
    private static final int W = 3;
    private static final int H = 4;
    private static final int TDP = 5;
    private static final int TWB = 6;
    private static final int RHO = 7;
    private static final int V = 8;
    private static final int PWS = 9;
    private static final int HS = 10;
    private static final int DHS = 11;

    /** Tolerances stated in the CSV header: 1e-6 relative for closed forms, 0.001 K for iterated temperatures. */
    private static final double CLOSED = 1e-6;
    private static final double ITERATED = 0.001;

    private static List<double[]> psychrolib() {
        List<double[]> rows = Reference.csv("/reference/psychro_psychrolib.csv");
        assertThat(rows).hasSize(342);
        return rows;
    }

    /**
     * ASHRAE Fundamentals 2017 Ch. 1 Table 2 (moist air at 101.325 kPa), W_s, as quoted in
     * PsychroLib's test suite (tests/test_psychrolib_si.py), plus 20 C from memory. Table 2 is a
     * real-gas table (enhancement factor included); Ch. 1 (citing Kuehn et al. 1998) bounds the
     * perfect-gas relations within 0.7 % of it from -50 C to 50 C. At 85 C, beyond that statement,
     * 1.5 % is allowed (the real-gas correction grows as p_ws nears p; observed 1.2 %).
     */
    @Test
    void ashraeTable2SaturationHumidityRatio() {
        double[][] table = {
            {-50, 0.0000243}, {-20, 0.0006373}, {-5, 0.0024863}, {5, 0.005425},
            {20, 0.014758}, {25, 0.020173}, {50, 0.086863},
        };
        for (double[] row : table) {
            assertRelative(row[1], Psychrometrics.saturationHumidityRatio(row[0] + K, P0), 0.007,
                    "W_s at " + row[0] + " C, ASHRAE Fundamentals 2017 Ch.1 Table 2" + (row[0] == 20 ? " (from memory)" : ""));
        }
        assertRelative(0.838105, Psychrometrics.saturationHumidityRatio(85 + K, P0), 0.015,
                "W_s at 85 C, ASHRAE Fundamentals 2017 Ch.1 Table 2");
    }

    /**
     * ASHRAE Fundamentals 2017 Ch. 1 Table 2, h_s in kJ/kg dry air, as quoted in PsychroLib's test
     * suite, plus 20 C from memory. Tolerance: 0.7 % (Kuehn et al. 1998, as stated in Ch. 1) of the
     * magnitudes of the dry-air and vapour terms together, since h_s passes through zero near
     * -5 C; 1.5 % at 85 C as for W_s.
     */
    @Test
    void ashraeTable2SaturatedEnthalpy() {
        double[][] table = {
            {-50, -50.222}, {-20, -18.542}, {-5, 1.164}, {5, 18.639},
            {20, 57.555}, {25, 76.504}, {50, 275.353}, {85, 2307.539},
        };
        for (double[] row : table) {
            double t = row[0];
            double ws = Psychrometrics.saturationHumidityRatio(t + K, P0);
            double magnitude = Math.abs(1006 * t) + ws * (2_501_000 + 1860 * t);
            double tol = (t > 50 ? 0.015 : 0.007) * magnitude;
            double hs = Psychrometrics.saturatedEnthalpy(t + K, P0);
            assertThat(hs).as("h_s at %s C, ASHRAE Fundamentals 2017 Ch.1 Table 2%s", t, t == 20 ? " (from memory)" : "")
                    .isCloseTo(row[1] * 1000, Offset.offset(tol));
        }
    }

    /**
     * ASHRAE Fundamentals 2017 Ch. 1 Table 2 at 25 C, dry air: h_da = 25.148 kJ/kg and
     * v_da = 0.8443 m3/kg (as quoted in PsychroLib's test suite); the table is real-gas, so 3e-4
     * and 1e-3 relative.
     */
    @Test
    void ashraeTable2DryAirAt25C() {
        assertRelative(25148, Psychrometrics.enthalpy(25 + K, 0), 3e-4, "h_da at 25 C, ASHRAE 2017 Ch.1 Table 2");
        assertRelative(0.8443, Psychrometrics.specificVolume(25 + K, 0, P0), 1e-3, "v_da at 25 C, ASHRAE 2017 Ch.1 Table 2");
    }

    /** ASHRAE Fundamentals 2017 Ch. 1 Table 1 (standard atmosphere), as quoted in PsychroLib's test suite, to 1 Pa. */
    @Test
    void ashraeTable1StandardAtmosphere() {
        double[][] table = {
            {-500, 107478}, {0, 101325}, {500, 95461}, {1000, 89875}, {4000, 61640}, {10000, 26436},
        };
        for (double[] row : table) {
            assertThat(Psychrometrics.standardAtmospherePressure(row[0])).as("p at %s m, ASHRAE 2017 Ch.1 Table 1", row[0])
                    .isCloseTo(row[1], Offset.offset(1.0));
        }
    }

    /** The worked example of the Psychrometrics Javadoc (same point as a row of the PsychroLib CSV). */
    @Test
    void workedExample() {
        double w = Psychrometrics.humidityRatioFromRelativeHumidity(298.15, 0.6, P0);
        assertRelative(0.0118950, w, 1e-5, "W");
        assertRelative(55452.6, Psychrometrics.enthalpy(298.15, w), 1e-6, "h");
        assertThat(Psychrometrics.dewPointFromHumidityRatio(w, P0)).isCloseTo(289.851, Offset.offset(5e-4));
        assertThat(Psychrometrics.wetBulb(298.15, w, P0)).isCloseTo(292.621, Offset.offset(5e-4));
    }

    /** PsychroLib 1.1.1 reference data: humidity ratio, enthalpy, density, volume, p_ws, h_s (closed forms). */
    @Test
    void psychrolibClosedForms() {
        for (double[] r : psychrolib()) {
            String at = String.format("T=%.2f K, RH=%s, p=%s Pa (PsychroLib 1.1.1)", r[T], r[RH], r[P]);
            double w = Psychrometrics.humidityRatioFromRelativeHumidity(r[T], r[RH], r[P]);
            assertRelative(r[W], w, CLOSED, "W at " + at);
            assertRelative(r[H], Psychrometrics.enthalpy(r[T], r[W]), CLOSED, "h at " + at);
            assertRelative(r[RHO], Psychrometrics.density(r[T], r[W], r[P]), CLOSED, "rho at " + at);
            assertRelative(r[V], Psychrometrics.specificVolume(r[T], r[W], r[P]), CLOSED, "v at " + at);
            assertRelative(r[PWS], Psychrometrics.saturationPressure(r[T]), CLOSED, "p_ws at " + at);
            assertRelative(r[HS], Psychrometrics.saturatedEnthalpy(r[T], r[P]), CLOSED, "h_s at " + at);
            assertRelative(r[RH], Psychrometrics.relativeHumidity(r[T], r[W], r[P]), CLOSED, "RH at " + at);
        }
    }

    /** PsychroLib 1.1.1 reference data: dew point and wet bulb, within PsychroLib's 0.001 K iteration tolerance. */
    @Test
    void psychrolibIteratedTemperatures() {
        for (double[] r : psychrolib()) {
            String at = String.format("T=%.2f K, RH=%s, p=%s Pa (PsychroLib 1.1.1)", r[T], r[RH], r[P]);
            assertThat(Psychrometrics.dewPointFromHumidityRatio(r[W], r[P])).as("dew point at " + at)
                    .isCloseTo(r[TDP], Offset.offset(ITERATED));
            assertThat(Psychrometrics.wetBulb(r[T], r[W], r[P])).as("wet bulb at " + at)
                    .isCloseTo(r[TWB], Offset.offset(ITERATED));
        }
    }

    /** dh_s/dT against a central difference of PsychroLib's h_s (step 0.01 K), 1e-5 relative. */
    @Test
    void psychrolibSaturatedEnthalpySlope() {
        for (double[] r : psychrolib()) {
            assertRelative(r[DHS], Psychrometrics.saturatedEnthalpySlope(r[T], r[P]), 1e-5,
                    String.format("dh_s/dT at T=%.2f K, p=%s Pa (PsychroLib 1.1.1, central difference)", r[T], r[P]));
        }
    }

    /** Invariant: dh_s/dT against a central difference of this class's own h_s across the range. */
    @Test
    void saturatedEnthalpySlopeMatchesOwnDifference() {
        for (double t = 175; t <= 350; t += 3.7) {
            double d = 1e-3;
            double fd = (Psychrometrics.saturatedEnthalpy(t + d, P0) - Psychrometrics.saturatedEnthalpy(t - d, P0)) / (2 * d);
            assertRelative(fd, Psychrometrics.saturatedEnthalpySlope(t, P0), 1e-6, "dh_s/dT at " + t + " K");
            assertThat(Psychrometrics.saturatedEnthalpySlope(t, P0)).isGreaterThan(1006);
        }
    }

    /** Invariant: dew point <= wet bulb <= dry bulb over a grid, with equality at saturation. */
    @Test
    void dewPointBelowWetBulbBelowDryBulb() {
        for (double p : new double[] {P0, 90000, 80000}) {
            for (double t = 233.15; t <= 353.15; t += 2.5) {
                for (double rh = 0.02; rh < 1; rh += 0.07) {
                    double w = Psychrometrics.humidityRatioFromRelativeHumidity(t, rh, p);
                    double dp = Psychrometrics.dewPointFromHumidityRatio(w, p);
                    double wb = Psychrometrics.wetBulb(t, w, p);
                    assertThat(dp).as("dew point at %s K, %s", t, rh).isLessThanOrEqualTo(wb + 1e-9);
                    assertThat(wb).as("wet bulb at %s K, %s", t, rh).isLessThan(t);
                }
                double ws = Psychrometrics.saturationHumidityRatio(t, p);
                assertThat(Psychrometrics.wetBulb(t, ws, p)).isCloseTo(t, Offset.offset(1e-8));
                assertThat(Psychrometrics.dewPointFromHumidityRatio(ws, p)).isCloseTo(t, Offset.offset(1e-8));
            }
        }
    }

    /** Invariant: at fixed dry bulb the wet bulb rises with the humidity ratio; inverse of eqs. 33/35. */
    @Test
    void wetBulbRisesWithHumidityAndInvertsEquation33And35() {
        double t = 283.15;
        double previous = 0;
        double ws = Psychrometrics.saturationHumidityRatio(t, P0);
        for (double w = 0; w <= ws; w += ws / 40) {
            double wb = Psychrometrics.wetBulb(t, w, P0);
            assertThat(wb).isGreaterThan(previous);
            previous = wb;
            if (Math.abs(wb - K) > 1e-6) {
                assertRelative(w, Psychrometrics.humidityRatioFromWetBulb(t, wb, P0), 1e-7, "W(T*) at W=" + w);
            }
        }
    }

    /** Invariant: the standard-atmosphere pressure falls with altitude. */
    @Test
    void standardPressureFallsWithAltitude() {
        double previous = Double.MAX_VALUE;
        for (double z = -500; z <= 11000; z += 250) {
            double p = Psychrometrics.standardAtmospherePressure(z);
            assertThat(p).isLessThan(previous);
            previous = p;
        }
    }

    @Test
    void dryBulbFromEnthalpyInvertsEquation32() {
        for (double t = 180; t < 470; t += 11) {
            for (double w : new double[] {0, 0.001, 0.01, 0.1}) {
                assertRelative(t, Psychrometrics.dryBulbFromEnthalpy(Psychrometrics.enthalpy(t, w), w), 1e-12, "T at W=" + w);
            }
        }
    }

    @Test
    void rejectsInvalidInputNamingTheField() {
        assertField(() -> Psychrometrics.humidityRatioFromRelativeHumidity(300, 1.01, P0), "relativeHumidity");
        assertField(() -> Psychrometrics.humidityRatioFromRelativeHumidity(300, -0.1, P0), "relativeHumidity");
        assertField(() -> Psychrometrics.enthalpy(300, -0.001), "humidityRatio");
        assertField(() -> Psychrometrics.humidityRatio(P0, P0), "vapourPressure");
        assertField(() -> Psychrometrics.humidityRatio(1000, 0), "pressure");
        assertField(() -> Psychrometrics.humidityRatioFromWetBulb(300, 301, P0), "wetBulb");
        assertField(() -> Psychrometrics.humidityRatioFromWetBulb(313.15, 278.15, P0), "wetBulb");
        assertField(() -> Psychrometrics.standardAtmospherePressure(12000), "altitude");
        assertField(() -> Psychrometrics.specificVolume(Double.NaN, 0.01, P0), "temperature");
        assertField(() -> Psychrometrics.dryBulbFromEnthalpy(Double.POSITIVE_INFINITY, 0.01), "enthalpy");
    }

    @Test
    void refusesStatesOutsideTheFormulation() {
        assertThatThrownBy(() -> Psychrometrics.dewPoint(0)).isInstanceOf(OutOfRangeException.class);
        assertThatThrownBy(() -> Psychrometrics.saturationHumidityRatio(373.15, P0)).isInstanceOf(OutOfRangeException.class);
        assertThatThrownBy(() -> Psychrometrics.saturatedEnthalpy(500, P0)).isInstanceOf(OutOfRangeException.class);
        assertThatThrownBy(() -> Psychrometrics.wetBulb(173.15, 0, P0)).isInstanceOf(OutOfRangeException.class);
    }

    private static void assertField(ThrowingCallable call, String field) {
        assertThatThrownBy(call).isInstanceOf(InputException.class)
                .satisfies(e -> assertThat(((InputException) e).field()).isEqualTo(field));
    }
}
