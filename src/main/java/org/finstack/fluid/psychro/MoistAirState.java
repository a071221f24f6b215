package org.finstack.fluid.psychro;

import java.util.Locale;
import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.core.OutOfRangeException;

/**
 * A state of moist air, fixed by dry bulb, humidity ratio and barometric pressure, with the
 * properties of ASHRAE Handbook&mdash;Fundamentals (2017) Ch. 1 (see {@link Psychrometrics} for
 * the equations). Factories build it from any other pair of independent properties at a given
 * pressure: relative humidity, wet bulb, dew point, or enthalpy with humidity ratio.
 *
 * <p>Supersaturated air (fog, W above W<sub>s</sub>) is refused; a state may be exactly saturated.
 *
 * <p>Worked example: {@code MoistAirState.fromRelativeHumidity(298.15, 0.6, 101325)} has
 * humidity ratio 0.0118950 kg/kg, enthalpy 55 452.6 J/kg dry air, dew point 289.851 K, wet bulb
 * 292.621 K and density 1.17556 kg/m&sup3;.
 *
 * @param dryBulb       dry-bulb temperature T [K], 173.15 to 473.15
 * @param humidityRatio humidity ratio W [kg water / kg dry air], &ge; 0 and not above saturation
 * @param pressure      barometric pressure p [Pa], &gt; 0
 */
public record MoistAirState(double dryBulb, double humidityRatio, double pressure) {

    /** Relative tolerance on the vapour pressure above saturation still taken as saturated (round-off). */
    private static final double SATURATION_SLACK = 1e-9;

    /**
     * Validates the state.
     *
     * @throws InputException      on a non-finite value, a negative humidity ratio, a pressure not
     *                             above zero, or supersaturation
     * @throws OutOfRangeException if the dry bulb lies outside 173.15 K to 473.15 K
     */
    public MoistAirState {
        Check.finite("dryBulb", dryBulb);
        Check.nonNegative("humidityRatio", humidityRatio);
        Check.positive("pressure", pressure);
        double pws = Psychrometrics.saturationPressure(dryBulb);
        double pw = Psychrometrics.vapourPressure(humidityRatio, pressure);
        if (pw > pws * (1 + SATURATION_SLACK)) {
            throw new InputException("humidityRatio", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                    "%s kg/kg is supersaturated: its vapour pressure %s Pa exceeds the saturation pressure "
                            + "%s Pa at %s K (fog is not handled)",
                    Numbers.brief(humidityRatio), Numbers.brief(pw), Numbers.brief(pws), Numbers.brief(dryBulb)));
        }
    }

    /**
     * State from dry bulb and relative humidity.
     *
     * @param dryBulb          T [K]
     * @param relativeHumidity &phi; [-], 0 to 1
     * @param pressure         p [Pa]
     * @return the state
     */
    public static MoistAirState fromRelativeHumidity(double dryBulb, double relativeHumidity, double pressure) {
        return new MoistAirState(dryBulb,
                Psychrometrics.humidityRatioFromRelativeHumidity(dryBulb, relativeHumidity, pressure), pressure);
    }

    /**
     * State from dry bulb and thermodynamic wet bulb (Ch. 1 eqs. 33/35).
     *
     * @param dryBulb  T [K]
     * @param wetBulb  T* [K], &le; T
     * @param pressure p [Pa]
     * @return the state
     */
    public static MoistAirState fromWetBulb(double dryBulb, double wetBulb, double pressure) {
        return new MoistAirState(dryBulb, Psychrometrics.humidityRatioFromWetBulb(dryBulb, wetBulb, pressure),
                pressure);
    }

    /**
     * State from dry bulb and dew point.
     *
     * @param dryBulb  T [K]
     * @param dewPoint T<sub>d</sub> [K], &le; T
     * @param pressure p [Pa]
     * @return the state
     */
    public static MoistAirState fromDewPoint(double dryBulb, double dewPoint, double pressure) {
        Check.finite("dryBulb", dryBulb);
        Check.finite("dewPoint", dewPoint);
        if (dewPoint > dryBulb) {
            throw new InputException("dewPoint", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                    "dew point %s K is above the dry bulb %s K", Numbers.brief(dewPoint), Numbers.brief(dryBulb)));
        }
        return new MoistAirState(dryBulb, Psychrometrics.humidityRatioFromDewPoint(dewPoint, pressure), pressure);
    }

    /**
     * State from enthalpy and humidity ratio; the dry bulb follows from eq. 32 in closed form.
     *
     * @param enthalpy      h [J/kg dry air]
     * @param humidityRatio W [kg/kg]
     * @param pressure      p [Pa]
     * @return the state
     */
    public static MoistAirState fromEnthalpy(double enthalpy, double humidityRatio, double pressure) {
        return new MoistAirState(Psychrometrics.dryBulbFromEnthalpy(enthalpy, humidityRatio), humidityRatio,
                pressure);
    }

    /** @return relative humidity &phi; = p<sub>w</sub>/p<sub>ws</sub> [-], 0 to 1 */
    public double relativeHumidity() {
        return Math.min(1, Psychrometrics.relativeHumidity(dryBulb, humidityRatio, pressure));
    }

    /**
     * @return dew point T<sub>d</sub> [K], &le; dry bulb
     * @throws OutOfRangeException for air so dry that the dew point lies below 173.15 K
     */
    public double dewPoint() {
        return Math.min(dryBulb, Psychrometrics.dewPointFromHumidityRatio(humidityRatio, pressure));
    }

    /** @return thermodynamic wet bulb T* [K], between the dew point and the dry bulb */
    public double wetBulb() {
        return Psychrometrics.wetBulb(dryBulb, humidityRatio, pressure);
    }

    /** @return enthalpy h [J/kg dry air], zero for dry air and liquid water at 0 &deg;C */
    public double enthalpy() {
        return Psychrometrics.enthalpy(dryBulb, humidityRatio);
    }

    /** @return density of the moist air &rho; = (1 + W)/v [kg/m&sup3;] */
    public double density() {
        return Psychrometrics.density(dryBulb, humidityRatio, pressure);
    }

    /** @return specific volume v [m&sup3;/kg dry air] */
    public double specificVolume() {
        return Psychrometrics.specificVolume(dryBulb, humidityRatio, pressure);
    }

    /** @return partial pressure of the water vapour p<sub>w</sub> [Pa] */
    public double vapourPressure() {
        return Psychrometrics.vapourPressure(humidityRatio, pressure);
    }

    /** @return humidity ratio at saturation at this dry bulb and pressure W<sub>s</sub> [kg/kg] */
    public double saturationHumidityRatio() {
        return Psychrometrics.saturationHumidityRatio(dryBulb, pressure);
    }
}
