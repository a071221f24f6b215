package org.finstack.fluid.psychro;

import java.util.Locale;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Limit;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.core.OutOfRangeException;
import org.finstack.core.Validity;

/**
 * Moist-air relations of ASHRAE Handbook&mdash;Fundamentals (2017) Chapter 1, as static pure
 * functions in SI units. Dry air and water vapour are perfect gases; the saturation pressure comes
 * from {@link HylandWexler1983SaturationPressure}. Temperatures are in [K] at the interface; the
 * handbook's equations written in &deg;C (t = T &minus; 273.15) are evaluated internally.
 *
 * <p>Equations used. Their numbers shift between editions of Ch. 1 (the enthalpy equation, for
 * instance, is eq. 32 in the 2009 and 2013 SI editions and eq. 30 in 2017, after PsychroLib's
 * source notes). The numbers below are given from memory and may differ by a few from the edition
 * at hand; each equation is identified by the form printed here:
 * <ul>
 *   <li>eq. 3, standard atmosphere: p = 101325 (1 &minus; 2.25577e-5 Z)<sup>5.2559</sup> [Pa], Z in [m];</li>
 *   <li>eq. 20, humidity ratio: W = 0.621945 p<sub>w</sub> / (p &minus; p<sub>w</sub>), and its
 *       saturated form W<sub>s</sub> = 0.621945 p<sub>ws</sub> / (p &minus; p<sub>ws</sub>);</li>
 *   <li>eq. 28, specific volume: v = 287.042 T (1 + 1.607858 W) / p [m&sup3;/kg dry air], and the
 *       moist-air density &rho; = (1 + W) / v [kg/m&sup3;];</li>
 *   <li>eq. 32, enthalpy: h = 1.006 t + W (2501 + 1.86 t) [kJ/kg dry air], t in [&deg;C],
 *       returned here in [J/kg dry air]; its zero is dry air at 0 &deg;C and liquid water at 0 &deg;C;</li>
 *   <li>eq. 33 (wet bulb t* &ge; 0 &deg;C, liquid water):
 *       W = ((2501 &minus; 2.326 t*) W<sub>s</sub>* &minus; 1.006 (t &minus; t*)) / (2501 + 1.86 t &minus; 4.186 t*);</li>
 *   <li>eq. 35 (wet bulb t* &lt; 0 &deg;C, ice):
 *       W = ((2830 &minus; 0.24 t*) W<sub>s</sub>* &minus; 1.006 (t &minus; t*)) / (2830 + 1.86 t &minus; 2.1 t*);</li>
 *   <li>eq. 36, dew point: p<sub>w</sub> = p<sub>ws</sub>(T<sub>d</sub>), solved here by a bounded
 *       bracketed iteration on ln p<sub>ws</sub> (to 1e-9 K) rather than by the regressions 37/38.</li>
 * </ul>
 *
 * <p>Validity: temperatures 173.15 K to 473.15 K (the saturation-pressure formulation; outside,
 * {@link OutOfRangeException}); altitudes &minus;500 m to 11 000 m (Ch. 1 Table 1, the troposphere;
 * outside, {@link InputException}). Published scatter: Ch. 1 (citing Kuehn et al. 1998) states that
 * the perfect-gas relations are within 0.7 % of the real-gas humidity ratio, enthalpy and specific
 * volume of saturated air at standard pressure from &minus;50 &deg;C to 50 &deg;C, the error
 * falling with pressure.
 *
 * <p>Worked example: air at T = 298.15 K (25 &deg;C), relative humidity 0.6 and p = 101325 Pa has
 * W = 0.0118950 kg/kg, h = 55 452.6 J/kg dry air, dew point 289.851 K and wet bulb 292.621 K.
 */
public final class Psychrometrics {

    /** The source of the relations. */
    public static final Citation SOURCE = Citation.of("ASHRAE 2017 Ch. 1",
            "ASHRAE (2017). ASHRAE Handbook - Fundamentals, SI edition, Chapter 1 Psychrometrics. "
                    + "American Society of Heating, Refrigerating and Air-Conditioning Engineers, Atlanta; "
                    + "saturation pressure after Hyland, R.W. and A. Wexler (1983), ASHRAE Transactions 89(2A): 500-519");

    /** Published ranges: temperature [K] of the saturation formulation, altitude [m] of Table 1. */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("T", 173.15, 473.15, "K"),
            Limit.of("Z", -500, 11000, "m"));

    /** Ratio of the molecular masses of water and dry air, 18.015268 / 28.966 (Ch. 1 eq. 20). */
    public static final double EPSILON = 0.621945;

    /** Gas constant of dry air [J/(kg K)] (Ch. 1 eq. 1). */
    public static final double R_DRY_AIR = 287.042;

    /** Zero of the Celsius scale [K] (definition). */
    public static final double ZERO_CELSIUS = 273.15;

    /** Standard sea-level pressure [Pa] (Ch. 1 eq. 3). */
    public static final double STANDARD_PRESSURE = 101325;

    // Ch. 1 eq. 28: 1.607858 = 1 / 0.621945, the ratio of the gas constants of vapour and dry air
    private static final double VAPOUR_VOLUME_FACTOR = 1.607858;
    // Ch. 1 eq. 32: specific heat of dry air [J/(kg K)], enthalpy of saturated vapour at 0 C [J/kg],
    // specific heat of water vapour [J/(kg K)]
    private static final double CP_DRY_AIR = 1006;
    private static final double H_VAPOUR_0C = 2_501_000;
    private static final double CP_VAPOUR = 1860;
    // Ch. 1 eq. 3: lapse-rate constant [1/m] and exponent of the standard atmosphere
    private static final double ALTITUDE_FACTOR = 2.25577e-5;
    private static final double ALTITUDE_EXPONENT = 5.2559;

    private static final double T_MIN = VALIDITY.limit("T").min();
    private static final double T_MAX = VALIDITY.limit("T").max();

    private Psychrometrics() {
    }

    /**
     * Saturation pressure of water vapour (over ice up to 273.16 K, over liquid water above).
     *
     * @param temperature temperature T [K]
     * @return p<sub>ws</sub> [Pa]
     */
    public static double saturationPressure(double temperature) {
        return HylandWexler1983SaturationPressure.pressure(temperature);
    }

    /**
     * Slope of the saturation-pressure curve.
     *
     * @param temperature temperature T [K]
     * @return dp<sub>ws</sub>/dT [Pa/K]
     */
    public static double saturationPressureSlope(double temperature) {
        return HylandWexler1983SaturationPressure.slope(temperature);
    }

    /**
     * Humidity ratio from the partial pressure of water vapour (eq. 20).
     *
     * @param vapourPressure partial pressure of the vapour p<sub>w</sub> [Pa], 0 &le; p<sub>w</sub> &lt; p
     * @param pressure       barometric pressure p [Pa]
     * @return W [kg water / kg dry air]
     */
    public static double humidityRatio(double vapourPressure, double pressure) {
        Check.positive("pressure", pressure);
        Check.nonNegative("vapourPressure", vapourPressure);
        if (!(vapourPressure < pressure)) {
            throw new InputException("vapourPressure", Msg.NOT_BELOW, vapourPressure, pressure);
        }
        return EPSILON * vapourPressure / (pressure - vapourPressure);
    }

    /**
     * Partial pressure of the vapour from the humidity ratio (eq. 20 solved for p<sub>w</sub>).
     *
     * @param humidityRatio W [kg/kg], &ge; 0
     * @param pressure      barometric pressure p [Pa]
     * @return p<sub>w</sub> = p W / (0.621945 + W) [Pa]
     */
    public static double vapourPressure(double humidityRatio, double pressure) {
        Check.nonNegative("humidityRatio", humidityRatio);
        Check.positive("pressure", pressure);
        return pressure * humidityRatio / (EPSILON + humidityRatio);
    }

    /**
     * Humidity ratio of saturated air (eq. 20 with p<sub>w</sub> = p<sub>ws</sub>).
     *
     * @param temperature temperature T [K]
     * @param pressure    barometric pressure p [Pa]
     * @return W<sub>s</sub> [kg/kg]
     * @throws OutOfRangeException if p<sub>ws</sub>(T) &ge; p (water boils: air cannot be saturated)
     */
    public static double saturationHumidityRatio(double temperature, double pressure) {
        return saturationHumidityRatio(temperature, saturationPressure(temperature), pressure);
    }

    private static double saturationHumidityRatio(double temperature, double pws, double pressure) {
        Check.positive("pressure", pressure);
        if (!(pws < pressure)) {
            throw new OutOfRangeException(Msg.FLUID_OUT_OF_RANGE, "moist air", "temperature [K]",
                    temperature, "below the boiling point at " + Numbers.brief(pressure) + " Pa");
        }
        return EPSILON * pws / (pressure - pws);
    }

    /**
     * Humidity ratio from the relative humidity: p<sub>w</sub> = &phi; p<sub>ws</sub>(T), then eq. 20.
     *
     * @param temperature      dry-bulb temperature T [K]
     * @param relativeHumidity &phi; [-], 0 to 1
     * @param pressure         barometric pressure p [Pa]
     * @return W [kg/kg]
     */
    public static double humidityRatioFromRelativeHumidity(double temperature, double relativeHumidity,
            double pressure) {
        Check.within("relativeHumidity", relativeHumidity, 0, 1);
        Check.positive("pressure", pressure);
        double pw = relativeHumidity * saturationPressure(temperature);
        if (!(pw < pressure)) {
            throw new OutOfRangeException(Msg.FLUID_OUT_OF_RANGE, "moist air", "vapour pressure [Pa]",
                    pw, "below the barometric pressure " + Numbers.brief(pressure) + " Pa");
        }
        return humidityRatio(pw, pressure);
    }

    /**
     * Relative humidity &phi; = p<sub>w</sub> / p<sub>ws</sub>(T).
     *
     * @param temperature   dry-bulb temperature T [K]
     * @param humidityRatio W [kg/kg]
     * @param pressure      barometric pressure p [Pa]
     * @return &phi; [-]; above 1 only for supersaturated input, which {@link MoistAirState} refuses
     */
    public static double relativeHumidity(double temperature, double humidityRatio, double pressure) {
        return vapourPressure(humidityRatio, pressure) / saturationPressure(temperature);
    }

    /**
     * Humidity ratio from the thermodynamic wet-bulb temperature (eq. 33 over liquid water for
     * t* &ge; 0 &deg;C, eq. 35 over ice below).
     *
     * @param temperature dry-bulb temperature T [K]
     * @param wetBulb     thermodynamic wet-bulb temperature T* [K], &le; T
     * @param pressure    barometric pressure p [Pa]
     * @return W [kg/kg]
     * @throws InputException if T* &gt; T, or if T* is below the wet bulb of dry air at T (W &lt; 0)
     */
    public static double humidityRatioFromWetBulb(double temperature, double wetBulb, double pressure) {
        Check.finite("temperature", temperature);
        Check.finite("wetBulb", wetBulb);
        if (wetBulb > temperature) {
            throw new InputException("wetBulb", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                    "wet bulb %s K is above the dry bulb %s K", Numbers.brief(wetBulb),
                    Numbers.brief(temperature)));
        }
        double w = wetBulbEquation(temperature, wetBulb, saturationHumidityRatio(wetBulb, pressure));
        if (w < 0) {
            throw new InputException("wetBulb", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                    "wet bulb %s K is below that of dry air at the dry bulb %s K (humidity ratio would be %s)",
                    Numbers.brief(wetBulb), Numbers.brief(temperature), Numbers.brief(w)));
        }
        return w;
    }

    /**
     * Humidity ratio from the dew point: W = W<sub>s</sub>(T<sub>d</sub>, p) (eqs. 36 and 20).
     *
     * @param dewPoint dew-point temperature T<sub>d</sub> [K]
     * @param pressure barometric pressure p [Pa]
     * @return W [kg/kg]
     */
    public static double humidityRatioFromDewPoint(double dewPoint, double pressure) {
        return saturationHumidityRatio(dewPoint, pressure);
    }

    /**
     * Dew point: the temperature at which p<sub>ws</sub> equals the given vapour pressure (eq. 36),
     * solved by a bounded bracketed iteration on ln p<sub>ws</sub> to 1e-9 K.
     *
     * @param vapourPressure partial pressure of the vapour p<sub>w</sub> [Pa], &gt; 0
     * @return T<sub>d</sub> [K]
     * @throws OutOfRangeException if p<sub>w</sub> lies outside p<sub>ws</sub>(173.15 K) to
     *                             p<sub>ws</sub>(473.15 K) (including dry air, p<sub>w</sub> = 0)
     */
    public static double dewPoint(double vapourPressure) {
        Check.nonNegative("vapourPressure", vapourPressure);
        double lnMin = HylandWexler1983SaturationPressure.lnPressure(T_MIN);
        double lnMax = HylandWexler1983SaturationPressure.lnPressure(T_MAX);
        double target = Math.log(vapourPressure);
        if (!(target >= lnMin && target <= lnMax)) {
            throw new OutOfRangeException(Msg.FLUID_OUT_OF_RANGE, "moist air", "vapour pressure [Pa]",
                    vapourPressure, "p_ws(173.15 K) = " + Numbers.brief(Math.exp(lnMin)) + " Pa to p_ws(473.15 K) = "
                            + Numbers.brief(Math.exp(lnMax)) + " Pa, so that the dew point lies in 173.15 K to 473.15 K");
        }
        return Bracket.solve(t -> HylandWexler1983SaturationPressure.lnPressure(t) - target,
                T_MIN, lnMin - target, T_MAX, lnMax - target, "dew point");
    }

    /**
     * Dew point from the humidity ratio.
     *
     * @param humidityRatio W [kg/kg], &gt; 0
     * @param pressure      barometric pressure p [Pa]
     * @return T<sub>d</sub> [K]
     */
    public static double dewPointFromHumidityRatio(double humidityRatio, double pressure) {
        return dewPoint(vapourPressure(humidityRatio, pressure));
    }

    /**
     * Thermodynamic wet-bulb temperature from dry bulb and humidity ratio: the T* at which eq. 33
     * (or 35 below 0 &deg;C) returns W, found by a bounded bracketed iteration between
     * 173.15 K and T to 1e-9 K. Where the switch from eq. 35 to eq. 33 at 0 &deg;C makes W(T*)
     * step over the given W, the result is 273.15 K.
     *
     * @param temperature   dry-bulb temperature T [K]
     * @param humidityRatio W [kg/kg], &ge; 0 and not above saturation at T
     * @param pressure      barometric pressure p [Pa]
     * @return T* [K], &le; T
     * @throws OutOfRangeException if the wet bulb would lie below 173.15 K
     */
    public static double wetBulb(double temperature, double humidityRatio, double pressure) {
        Check.nonNegative("humidityRatio", humidityRatio);
        Check.positive("pressure", pressure);
        saturationPressure(temperature);
        double hi = temperature;
        if (!(saturationPressure(hi) < pressure)) {
            // above the boiling point at p: the wet bulb lies below it
            hi = dewPoint(pressure * (1 - 1e-9));
        }
        double fhi = wetBulbEquation(temperature, hi, saturationHumidityRatio(hi, pressure)) - humidityRatio;
        if (fhi <= 0) {
            return hi;
        }
        double lo = T_MIN;
        double flo = wetBulbEquation(temperature, lo, saturationHumidityRatio(lo, pressure)) - humidityRatio;
        if (flo > 0) {
            throw new OutOfRangeException(Msg.FLUID_OUT_OF_RANGE, "moist air", "wet bulb [K]",
                    "below 173.15", "173.15 K to 473.15 K");
        }
        return Bracket.solve(ts -> wetBulbEquation(temperature, ts, saturationHumidityRatio(ts, pressure))
                - humidityRatio, lo, flo, hi, fhi, "wet bulb");
    }

    /**
     * Enthalpy of moist air per kilogram of dry air (eq. 32), zero for dry air at 0 &deg;C and
     * liquid water at 0 &deg;C.
     *
     * @param temperature   dry-bulb temperature T [K]
     * @param humidityRatio W [kg/kg], &ge; 0
     * @return h = 1006 t + W (2 501 000 + 1860 t) [J/kg dry air], t = T &minus; 273.15 [&deg;C]
     */
    public static double enthalpy(double temperature, double humidityRatio) {
        Check.finite("temperature", temperature);
        Check.nonNegative("humidityRatio", humidityRatio);
        double t = temperature - ZERO_CELSIUS;
        return CP_DRY_AIR * t + humidityRatio * (H_VAPOUR_0C + CP_VAPOUR * t);
    }

    /**
     * Dry-bulb temperature from enthalpy and humidity ratio (eq. 32 solved for t, a closed form).
     *
     * @param enthalpy      h [J/kg dry air]
     * @param humidityRatio W [kg/kg], &ge; 0
     * @return T = 273.15 + (h &minus; 2 501 000 W) / (1006 + 1860 W) [K]
     */
    public static double dryBulbFromEnthalpy(double enthalpy, double humidityRatio) {
        Check.finite("enthalpy", enthalpy);
        Check.nonNegative("humidityRatio", humidityRatio);
        return ZERO_CELSIUS + (enthalpy - H_VAPOUR_0C * humidityRatio) / (CP_DRY_AIR + CP_VAPOUR * humidityRatio);
    }

    /**
     * Specific volume of moist air per kilogram of dry air (eq. 28).
     *
     * @param temperature   dry-bulb temperature T [K], &gt; 0
     * @param humidityRatio W [kg/kg], &ge; 0
     * @param pressure      barometric pressure p [Pa]
     * @return v = 287.042 T (1 + 1.607858 W) / p [m&sup3;/kg dry air]
     */
    public static double specificVolume(double temperature, double humidityRatio, double pressure) {
        Check.positive("temperature", temperature);
        Check.nonNegative("humidityRatio", humidityRatio);
        Check.positive("pressure", pressure);
        return R_DRY_AIR * temperature * (1 + VAPOUR_VOLUME_FACTOR * humidityRatio) / pressure;
    }

    /**
     * Density of moist air, &rho; = (1 + W) / v.
     *
     * @param temperature   dry-bulb temperature T [K], &gt; 0
     * @param humidityRatio W [kg/kg], &ge; 0
     * @param pressure      barometric pressure p [Pa]
     * @return &rho; [kg moist air / m&sup3;]
     */
    public static double density(double temperature, double humidityRatio, double pressure) {
        return (1 + humidityRatio) / specificVolume(temperature, humidityRatio, pressure);
    }

    /**
     * Barometric pressure of the standard atmosphere at an altitude (eq. 3).
     *
     * @param altitude altitude above sea level Z [m], &minus;500 to 11 000
     * @return p = 101325 (1 &minus; 2.25577e-5 Z)<sup>5.2559</sup> [Pa]
     */
    public static double standardAtmospherePressure(double altitude) {
        Limit z = VALIDITY.limit("Z");
        Check.within("altitude", altitude, z.min(), z.max());
        return STANDARD_PRESSURE * Math.pow(1 - ALTITUDE_FACTOR * altitude, ALTITUDE_EXPONENT);
    }

    /**
     * Enthalpy of saturated air at a (surface) temperature, h<sub>s</sub>(T) = h(T, W<sub>s</sub>(T, p)),
     * as wet-coil methods need it.
     *
     * @param temperature temperature T [K]
     * @param pressure    barometric pressure p [Pa]
     * @return h<sub>s</sub> [J/kg dry air]
     */
    public static double saturatedEnthalpy(double temperature, double pressure) {
        return enthalpy(temperature, saturationHumidityRatio(temperature, pressure));
    }

    /**
     * Slope of the saturated-air enthalpy, analytically:
     * dh<sub>s</sub>/dT = 1006 + 1860 W<sub>s</sub> + (2 501 000 + 1860 t) dW<sub>s</sub>/dT, with
     * dW<sub>s</sub>/dT = 0.621945 p (dp<sub>ws</sub>/dT) / (p &minus; p<sub>ws</sub>)<sup>2</sup>.
     * It has a small step at the triple point 273.16 K, where p<sub>ws</sub> switches from ice to
     * liquid.
     *
     * @param temperature temperature T [K]
     * @param pressure    barometric pressure p [Pa]
     * @return dh<sub>s</sub>/dT [J/(kg dry air K)]
     */
    public static double saturatedEnthalpySlope(double temperature, double pressure) {
        double pws = saturationPressure(temperature);
        double ws = saturationHumidityRatio(temperature, pws, pressure);
        double dpws = pws * HylandWexler1983SaturationPressure.lnPressureSlope(temperature);
        double dws = EPSILON * pressure * dpws / ((pressure - pws) * (pressure - pws));
        double t = temperature - ZERO_CELSIUS;
        return CP_DRY_AIR + CP_VAPOUR * ws + (H_VAPOUR_0C + CP_VAPOUR * t) * dws;
    }

    /**
     * Eq. 33 (t* &ge; 0 &deg;C) or eq. 35 (t* &lt; 0 &deg;C), written in &deg;C as printed; the ratio is
     * the same in any consistent energy unit.
     */
    private static double wetBulbEquation(double temperature, double wetBulb, double wsStar) {
        double t = temperature - ZERO_CELSIUS;
        double ts = wetBulb - ZERO_CELSIUS;
        if (ts >= 0) {
            // Ch. 1 eq. 33, over liquid water
            return ((2501 - 2.326 * ts) * wsStar - 1.006 * (t - ts)) / (2501 + 1.86 * t - 4.186 * ts);
        }
        // Ch. 1 eq. 35, over ice
        return ((2830 - 0.24 * ts) * wsStar - 1.006 * (t - ts)) / (2830 + 1.86 * t - 2.1 * ts);
    }
}
