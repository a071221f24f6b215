package org.finstack.study.diagnosis;

import java.util.Locale;
import java.util.Objects;
import org.finstack.coil.AirInlet;
import org.finstack.coil.CoilCase;
import org.finstack.coil.Duty;
import org.finstack.coil.RefrigerantSide;
import org.finstack.coil.RefrigerantSide.Target;
import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.fluid.psychro.Psychrometrics;

/**
 * A set of field readings on one coil (the measurement file's {@code measured} object).
 * Physically impossible sets are refused up front, each with one line naming the field:
 * leaving air not colder than entering air on an evaporator (not warmer on a condenser), zero
 * airflow, an evaporator's saturation temperature not below the entering air (a condenser's not
 * above it), leaving air colder than an evaporator's refrigerant, a relative humidity above
 * 100 %, an evaporator adding moisture to the air, a negative superheat or subcooling.
 *
 * @param duty                      evaporator or condenser
 * @param airInletTemperature       entering dry bulb [K]
 * @param airOutletTemperature      leaving dry bulb, mixed [K]
 * @param airInletRelativeHumidity  entering relative humidity [-], 0..1 (0 for a condenser if not measured)
 * @param airOutletRelativeHumidity leaving relative humidity [-], or {@code null} if not measured
 * @param volumeFlow                airflow at the entering state [m3/s]
 * @param saturationTemperature     refrigerant saturation temperature [K] (dew point at the
 *                                  evaporator outlet or condenser inlet, from the suction or
 *                                  discharge pressure)
 * @param outletCondition           superheat (evaporator) or subcooling (condenser) at the outlet [K]
 * @param refrigerantMassFlow       refrigerant mass flow [kg/s], or {@code null} if not measured
 * @param pressure                  barometric pressure [Pa]
 * @param airPressureDrop           air-side pressure drop across the coil at the measured airflow
 *                                  [Pa], or {@code null} if not measured (then no deposit level is
 *                                  inferred from it)
 */
public record Measurements(Duty duty, Reading airInletTemperature, Reading airOutletTemperature,
        Reading airInletRelativeHumidity, Reading airOutletRelativeHumidity, Reading volumeFlow,
        Reading saturationTemperature, Reading outletCondition, Reading refrigerantMassFlow, double pressure,
        Reading airPressureDrop) {

    private static final double KELVIN = 273.15;

    /** Validates the readings and their combination. */
    public Measurements {
        Objects.requireNonNull(duty, "duty");
        boolean evaporator = duty == Duty.EVAPORATOR;
        String held = evaporator ? "superheat" : "subcooling";
        required("airInletTemperature", airInletTemperature);
        required("airOutletTemperature", airOutletTemperature);
        required("volumeFlow", volumeFlow);
        required("saturationTemperature", saturationTemperature);
        required(held, outletCondition);
        if (airInletRelativeHumidity == null) {
            if (evaporator) {
                throw new InputException("measured.airInletRelativeHumidity", Msg.IMPOSSIBLE,
                        "is missing: an evaporator's duty depends on the entering humidity");
            }
            airInletRelativeHumidity = Reading.exact(0);
        }
        double tIn = airInletTemperature.value();
        double tOut = airOutletTemperature.value();
        double tSat = saturationTemperature.value();
        Check.within("measured.airInletTemperature", tIn, 173.15, 373.15);
        Check.within("measured.airOutletTemperature", tOut, 173.15, 373.15);
        Check.within("measured.saturationTemperature", tSat, 173.15, 373.15);
        Check.positive("measured.volumeFlow", volumeFlow.value());
        Check.within("measured.pressure", pressure, 50_000, 120_000);
        humidity("measured.airInletRelativeHumidity", airInletRelativeHumidity.value());
        if (airOutletRelativeHumidity != null) {
            humidity("measured.airOutletRelativeHumidity", airOutletRelativeHumidity.value());
        }
        Check.within("measured." + held, outletCondition.value(), 0, evaporator ? 60 : 40);
        if (refrigerantMassFlow != null) {
            Check.positive("measured.massFlow", refrigerantMassFlow.value());
        }
        if (airPressureDrop != null) {
            Check.positive("measured.airPressureDrop", airPressureDrop.value());
        }
        if (evaporator) {
            if (!(tOut < tIn)) {
                throw new InputException("measured.airOutletTemperature", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                        "leaving air %.2f C is not colder than the entering air %.2f C; an evaporator cools the air",
                        tOut - KELVIN, tIn - KELVIN));
            }
            if (!(tSat < tIn)) {
                throw new InputException("measured.saturationTemperature", Msg.DUTY_DIRECTION, duty.id(), "below",
                        tSat - KELVIN, tIn - KELVIN);
            }
            if (!(tOut > tSat)) {
                throw new InputException("measured.airOutletTemperature", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                        "leaving air %.2f C is not warmer than the evaporating refrigerant %.2f C; "
                                + "air cannot be cooled below the refrigerant", tOut - KELVIN, tSat - KELVIN));
            }
            if (airOutletRelativeHumidity != null) {
                double wIn = Psychrometrics.humidityRatioFromRelativeHumidity(tIn, airInletRelativeHumidity.value(), pressure);
                double wOut = Psychrometrics.humidityRatioFromRelativeHumidity(tOut, airOutletRelativeHumidity.value(),
                        pressure);
                if (wOut > wIn * (1 + 1e-9)) {
                    throw new InputException("measured.airOutletRelativeHumidity", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                            "the leaving air would hold more water (%.5f kg/kg) than the entering air (%.5f kg/kg); "
                                    + "an evaporator does not add moisture", wOut, wIn));
                }
            }
        } else {
            if (!(tOut > tIn)) {
                throw new InputException("measured.airOutletTemperature", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                        "leaving air %.2f C is not warmer than the entering air %.2f C; a condenser heats the air",
                        tOut - KELVIN, tIn - KELVIN));
            }
            if (!(tSat > tIn)) {
                throw new InputException("measured.saturationTemperature", Msg.DUTY_DIRECTION, duty.id(), "above",
                        tSat - KELVIN, tIn - KELVIN);
            }
        }
    }

    /**
     * Readings without the air pressure drop.
     *
     * @param duty                      evaporator or condenser
     * @param airInletTemperature       entering dry bulb [K]
     * @param airOutletTemperature      leaving dry bulb, mixed [K]
     * @param airInletRelativeHumidity  entering relative humidity [-], or {@code null} for a condenser
     * @param airOutletRelativeHumidity leaving relative humidity [-], or {@code null}
     * @param volumeFlow                airflow at the entering state [m3/s]
     * @param saturationTemperature     refrigerant saturation temperature [K]
     * @param outletCondition           superheat or subcooling [K]
     * @param refrigerantMassFlow       refrigerant mass flow [kg/s], or {@code null}
     * @param pressure                  barometric pressure [Pa]
     */
    public Measurements(Duty duty, Reading airInletTemperature, Reading airOutletTemperature,
            Reading airInletRelativeHumidity, Reading airOutletRelativeHumidity, Reading volumeFlow,
            Reading saturationTemperature, Reading outletCondition, Reading refrigerantMassFlow, double pressure) {
        this(duty, airInletTemperature, airOutletTemperature, airInletRelativeHumidity, airOutletRelativeHumidity,
                volumeFlow, saturationTemperature, outletCondition, refrigerantMassFlow, pressure, null);
    }

    /**
     * @param dp the air pressure drop reading [Pa], or {@code null}
     * @return these readings with it
     */
    public Measurements withAirPressureDrop(Reading dp) {
        return new Measurements(duty, airInletTemperature, airOutletTemperature, airInletRelativeHumidity,
                airOutletRelativeHumidity, volumeFlow, saturationTemperature, outletCondition, refrigerantMassFlow,
                pressure, dp);
    }

    private static void required(String key, Reading r) {
        if (r == null) {
            throw new InputException("measured." + key, Msg.MISSING);
        }
    }

    private static void humidity(String field, double rh) {
        Check.finite(field, rh);
        if (rh > 1) {
            throw new InputException(field, Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                    "%.1f %% is above 100 %% relative humidity (write 0.85 or \"85 %%\")", 100 * rh));
        }
        Check.nonNegative(field, rh);
    }

    /** @return the key of the outlet condition in files and messages: superheat or subcooling */
    public String outletConditionName() {
        return duty == Duty.EVAPORATOR ? "superheat" : "subcooling";
    }

    /**
     * The template case at the measured conditions: its air from the measured entering state and
     * airflow (the template's face-velocity profile kept), its refrigerant at the measured
     * saturation temperature with the measured superheat or subcooling held.
     *
     * @param template the coil, refrigerant and fouling parts
     * @return the case to rate
     */
    public CoilCase applyTo(CoilCase template) {
        RefrigerantSide r = template.refrigerant();
        if (r.duty() != duty) {
            throw new InputException("refrigerant.duty", Msg.IMPOSSIBLE, "is " + r.duty().id()
                    + " but the measurements are for a " + duty.id());
        }
        Target target = duty == Duty.EVAPORATOR ? new Target.Superheat(outletCondition.value())
                : new Target.Subcooling(outletCondition.value());
        RefrigerantSide side = new RefrigerantSide(r.fluid(), r.duty(), saturationTemperature.value(), r.convention(),
                r.insideCoefficient(), r.liquidTemperature(), r.inletTemperature(), target, r.model(), r.segments());
        AirInlet air = new AirInlet(airInletTemperature.value(), 0, volumeFlow.value(), pressure,
                airInletRelativeHumidity.value());
        return template.withAir(air).withRefrigerant(side);
    }

    /**
     * These readings with one value replaced (for sensitivities).
     *
     * @param input which reading
     * @param value its new value
     * @return the changed set (not re-validated against impossibility: a small step)
     */
    Measurements with(Input input, double value) {
        Reading tin = airInletTemperature;
        Reading tout = airOutletTemperature;
        Reading rhIn = airInletRelativeHumidity;
        Reading rhOut = airOutletRelativeHumidity;
        Reading v = volumeFlow;
        Reading sat = saturationTemperature;
        Reading out = outletCondition;
        Reading dp = airPressureDrop;
        switch (input) {
            case AIR_INLET_TEMPERATURE -> tin = new Reading(value, tin.accuracy());
            case AIR_OUTLET_TEMPERATURE -> tout = new Reading(value, tout.accuracy());
            case AIR_INLET_HUMIDITY -> rhIn = new Reading(value, rhIn.accuracy());
            case AIR_OUTLET_HUMIDITY -> rhOut = new Reading(value, rhOut.accuracy());
            case VOLUME_FLOW -> v = new Reading(value, v.accuracy());
            case SATURATION_TEMPERATURE -> sat = new Reading(value, sat.accuracy());
            case OUTLET_CONDITION -> out = new Reading(value, out.accuracy());
            case AIR_PRESSURE_DROP -> dp = new Reading(value, dp.accuracy());
            default -> throw new IllegalArgumentException(input.name());
        }
        return new Measurements(duty, tin, tout, rhIn, rhOut, v, sat, out, refrigerantMassFlow, pressure, dp);
    }

    /**
     * @param input which reading
     * @return it, or {@code null} if not measured
     */
    Reading get(Input input) {
        return switch (input) {
            case AIR_INLET_TEMPERATURE -> airInletTemperature;
            case AIR_OUTLET_TEMPERATURE -> airOutletTemperature;
            case AIR_INLET_HUMIDITY -> airInletRelativeHumidity;
            case AIR_OUTLET_HUMIDITY -> airOutletRelativeHumidity;
            case VOLUME_FLOW -> volumeFlow;
            case SATURATION_TEMPERATURE -> saturationTemperature;
            case OUTLET_CONDITION -> outletCondition;
            case AIR_PRESSURE_DROP -> airPressureDrop;
        };
    }

    /** The readings a diagnosis propagates, by their key in the file. */
    enum Input {
        AIR_INLET_TEMPERATURE("airInletTemperature"),
        AIR_OUTLET_TEMPERATURE("airOutletTemperature"),
        AIR_INLET_HUMIDITY("airInletRelativeHumidity"),
        AIR_OUTLET_HUMIDITY("airOutletRelativeHumidity"),
        VOLUME_FLOW("volumeFlow"),
        SATURATION_TEMPERATURE("saturationTemperature"),
        OUTLET_CONDITION("superheat/subcooling"),
        AIR_PRESSURE_DROP("airPressureDrop");

        private final String key;

        Input(String key) {
            this.key = key;
        }

        String key() {
            return key;
        }
    }
}
