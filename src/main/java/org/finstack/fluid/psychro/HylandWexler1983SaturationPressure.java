package org.finstack.fluid.psychro;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Msg;
import org.finstack.core.OutOfRangeException;
import org.finstack.core.Validity;

/**
 * Saturation pressure of pure water vapour over ice and over liquid water, Hyland &amp; Wexler
 * (1983), in the form of ASHRAE Handbook&mdash;Fundamentals (2017) Ch. 1, eqs. 5 and 6.
 *
 * <p>Over ice (eq. 5), with T in [K] and p<sub>ws</sub> in [Pa]:
 * <pre>
 *   ln p_ws = C1/T + C2 + C3 T + C4 T^2 + C5 T^3 + C6 T^4 + C7 ln T
 * </pre>
 * and over liquid water (eq. 6):
 * <pre>
 *   ln p_ws = C8/T + C9 + C10 T + C11 T^2 + C12 T^3 + C13 ln T
 * </pre>
 * with the constants C1..C13 as printed in Ch. 1 (see the fields' comments).
 *
 * <p>Validity: eq. 5 from 173.15 K (&minus;100 &deg;C) to the freezing point, eq. 6 from
 * 273.15 K to 473.15 K (200 &deg;C). The handbook splits the two at 0 &deg;C, which leaves a
 * step of 0.01 % between them; this class switches at the triple point 273.16 K instead, where
 * both equations give 611.657 Pa to within 6e-9 relative (so the curve is continuous and the
 * dew point can be solved across it). Outside 173.15 K to 473.15 K the class refuses with an
 * {@link OutOfRangeException}.
 *
 * <p>Published scatter: Chapter 1 states no scatter for eqs. 5 and 6. Its Table 3 (computed from
 * the IAPWS-95 formulation of Herrmann et al. 2009) agrees with them within 0.03 % from
 * &minus;20 &deg;C to 150 &deg;C, as the tests of this class check.
 *
 * <p>Worked example: at T = 293.15 K (20 &deg;C), p<sub>ws</sub> = 2338.80 Pa.
 */
public final class HylandWexler1983SaturationPressure {

    /** The source of the equations. */
    public static final Citation SOURCE = Citation.of("Hyland & Wexler 1983",
            "Hyland, R.W. and A. Wexler (1983). Formulations for the thermodynamic properties of the "
                    + "saturated phases of H2O from 173.15 K to 473.15 K. ASHRAE Transactions 89(2A): 500-519; "
                    + "as given in ASHRAE Handbook - Fundamentals (2017), Chapter 1 Psychrometrics, eqs. 5 and 6");

    /** Published range of the temperature [K]: eqs. 5 and 6 together. */
    public static final Validity VALIDITY = Validity.of(Limit.of("T", 173.15, 473.15, "K"));

    /** Triple point of water [K], where this class switches from ice to liquid (IAPWS, from memory). */
    public static final double TRIPLE_POINT = 273.16;

    // ASHRAE Handbook - Fundamentals (2017) Ch. 1 eq. 5, over ice
    private static final double C1 = -5.6745359e3;
    private static final double C2 = 6.3925247;
    private static final double C3 = -9.6778430e-3;
    private static final double C4 = 6.2215701e-7;
    private static final double C5 = 2.0747825e-9;
    private static final double C6 = -9.4840240e-13;
    private static final double C7 = 4.1635019;

    // ASHRAE Handbook - Fundamentals (2017) Ch. 1 eq. 6, over liquid water
    private static final double C8 = -5.8002206e3;
    private static final double C9 = 1.3914993;
    private static final double C10 = -4.8640239e-2;
    private static final double C11 = 4.1764768e-5;
    private static final double C12 = -1.4452093e-8;
    private static final double C13 = 6.5459673;

    private static final double T_MIN = VALIDITY.limit("T").min();
    private static final double T_MAX = VALIDITY.limit("T").max();

    private HylandWexler1983SaturationPressure() {
    }

    /**
     * Saturation pressure: over ice up to the triple point, over liquid water above it.
     *
     * @param temperature temperature T [K], 173.15 to 473.15
     * @return saturation pressure p<sub>ws</sub> [Pa]
     * @throws org.finstack.core.InputException if the temperature is not a number
     * @throws OutOfRangeException              outside 173.15 K to 473.15 K
     */
    public static double pressure(double temperature) {
        inRange(temperature);
        return Math.exp(lnPressure(temperature));
    }

    /**
     * Slope of the saturation curve, dp<sub>ws</sub>/dT = p<sub>ws</sub> d(ln p<sub>ws</sub>)/dT,
     * from the analytical derivative of eq. 5 or 6.
     *
     * @param temperature temperature T [K], 173.15 to 473.15
     * @return dp<sub>ws</sub>/dT [Pa/K]
     * @throws OutOfRangeException outside 173.15 K to 473.15 K
     */
    public static double slope(double temperature) {
        inRange(temperature);
        return Math.exp(lnPressure(temperature)) * lnPressureSlope(temperature);
    }

    /**
     * Natural logarithm of the saturation pressure, for inversions (dew point).
     *
     * @param temperature temperature T [K], 173.15 to 473.15
     * @return ln(p<sub>ws</sub> / 1 Pa)
     * @throws OutOfRangeException outside 173.15 K to 473.15 K
     */
    public static double lnPressure(double temperature) {
        inRange(temperature);
        double t = temperature;
        if (t <= TRIPLE_POINT) {
            return C1 / t + C2 + t * (C3 + t * (C4 + t * (C5 + t * C6))) + C7 * Math.log(t);
        }
        return C8 / t + C9 + t * (C10 + t * (C11 + t * C12)) + C13 * Math.log(t);
    }

    /**
     * d(ln p<sub>ws</sub>)/dT, the derivative of eq. 5 or 6.
     *
     * @param temperature temperature T [K], 173.15 to 473.15
     * @return d(ln p<sub>ws</sub>)/dT [1/K]
     * @throws OutOfRangeException outside 173.15 K to 473.15 K
     */
    public static double lnPressureSlope(double temperature) {
        inRange(temperature);
        double t = temperature;
        if (t <= TRIPLE_POINT) {
            return -C1 / (t * t) + C3 + t * (2 * C4 + t * (3 * C5 + t * 4 * C6)) + C7 / t;
        }
        return -C8 / (t * t) + C10 + t * (2 * C11 + t * 3 * C12) + C13 / t;
    }

    private static void inRange(double temperature) {
        Check.finite("temperature", temperature);
        if (temperature < T_MIN || temperature > T_MAX) {
            throw new OutOfRangeException(Msg.FLUID_OUT_OF_RANGE, "moist air", "temperature [K]",
                    temperature, "173.15 K to 473.15 K (Hyland & Wexler 1983)");
        }
    }
}
