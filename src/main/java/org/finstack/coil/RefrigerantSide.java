package org.finstack.coil;

import java.util.Objects;
import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The refrigerant side of a rating.
 *
 * <p>{@code saturationTemperature} is, by the convention of refrigeration practice, the dew-point
 * temperature at the evaporator outlet or at the condenser inlet; with
 * {@link SaturationConvention#MID} it is the mean of bubble and dew point at that pressure (only
 * a blend's glide makes the two differ).
 *
 * @param fluid                 refrigerant name as the user wrote it
 * @param duty                  condenser or evaporator
 * @param saturationTemperature saturation temperature [K] (see above); with a
 *                              {@link Target.Capacity} target the starting guess
 * @param convention            what the saturation temperature refers to
 * @param insideCoefficient     refrigerant film coefficient [W/(m2 K)], or 0 to take it from the
 *                              in-tube correlations
 * @param liquidTemperature     evaporator: liquid temperature at the expansion device [K], or 0
 * @param inletTemperature      condenser: entering gas temperature [K], or 0
 * @param target                what fixes the refrigerant flow
 * @param model                 which rating model
 * @param segments              segments per tube for the tube-by-tube model
 */
public record RefrigerantSide(String fluid, Duty duty, double saturationTemperature, SaturationConvention convention,
        double insideCoefficient, double liquidTemperature, double inletTemperature, Target target, Model model,
        int segments) {

    /** Largest number of segments per tube (a bound on run time and memory). */
    public static final int MAX_SEGMENTS = 200;

    /** Validates the values and their combination. */
    public RefrigerantSide {
        Objects.requireNonNull(fluid, "fluid");
        Objects.requireNonNull(duty, "duty");
        Objects.requireNonNull(convention, "convention");
        Objects.requireNonNull(target, "target");
        Objects.requireNonNull(model, "model");
        Check.within("saturationTemperature", saturationTemperature, 173.15, 373.15);
        Check.nonNegative("insideCoefficient", insideCoefficient);
        if (liquidTemperature != 0) {
            Check.within("liquidTemperature", liquidTemperature, 173.15, 373.15);
        }
        if (inletTemperature != 0) {
            Check.within("inletTemperature", inletTemperature, 173.15, 473.15);
        }
        Check.within("segments", segments, 1, MAX_SEGMENTS);
        if (model == Model.ISOTHERMAL) {
            if (insideCoefficient == 0) {
                throw new InputException("insideCoefficient", Msg.MISSING);
            }
        } else {
            if (target instanceof Target.None) {
                throw new InputException("superheat", Msg.IMPOSSIBLE, "the " + model.id() + " model needs "
                        + (duty == Duty.EVAPORATOR ? "superheat" : "subcooling") + ", massFlow or requiredCapacity");
            }
            if (duty == Duty.EVAPORATOR && liquidTemperature == 0) {
                throw new InputException("liquidTemperature", Msg.IMPOSSIBLE,
                        "is missing: the liquid temperature at the expansion device sets the evaporator's inlet quality");
            }
            if (duty == Duty.CONDENSER && inletTemperature == 0) {
                throw new InputException("inletTemperature", Msg.IMPOSSIBLE,
                        "is missing: the condenser's entering gas temperature sets its desuperheating");
            }
            if (target instanceof Target.Superheat && duty == Duty.CONDENSER) {
                throw new InputException("superheat", Msg.IMPOSSIBLE, "applies to evaporators; give a condenser's subcooling");
            }
            if (target instanceof Target.Subcooling && duty == Duty.EVAPORATOR) {
                throw new InputException("subcooling", Msg.IMPOSSIBLE, "applies to condensers; give an evaporator's superheat");
            }
        }
    }

    /**
     * The version-1 refrigerant side: two-phase at one saturation temperature with a given film
     * coefficient, rated by the isothermal model.
     *
     * @param fluid                 refrigerant name
     * @param duty                  condenser or evaporator
     * @param saturationTemperature [K]
     * @param insideCoefficient     [W/(m2 K)]
     */
    public RefrigerantSide(String fluid, Duty duty, double saturationTemperature, double insideCoefficient) {
        this(fluid, duty, saturationTemperature, SaturationConvention.DEW, insideCoefficient, 0, 0, new Target.None(),
                Model.ISOTHERMAL, 1);
    }

    /** What the saturation temperature refers to. */
    public enum SaturationConvention {
        /** Dew point at the evaporator outlet or condenser inlet (refrigeration practice). */
        DEW,
        /** Mean of bubble and dew temperature at that pressure. */
        MID
    }

    /** The rating models. */
    public enum Model {
        /** Two-phase at one temperature along the whole coil, film coefficient given. */
        ISOTHERMAL,
        /** Superheat / two-phase / subcool zones. */
        ZONES,
        /** Tube by tube along each circuit. */
        TUBES;

        /** @return the name used in case files */
        public String id() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    /** What fixes the refrigerant flow. */
    public sealed interface Target {
        /** No target: the isothermal model. */
        record None() implements Target {
        }

        /**
         * Evaporator outlet superheat to reach (the expansion valve's job).
         *
         * @param kelvin [K]
         */
        record Superheat(double kelvin) implements Target {
            /** Validates. */
            public Superheat {
                Check.within("superheat", kelvin, 0, 60);
            }
        }

        /**
         * Condenser outlet subcooling to reach.
         *
         * @param kelvin [K]
         */
        record Subcooling(double kelvin) implements Target {
            /** Validates. */
            public Subcooling {
                Check.within("subcooling", kelvin, 0, 40);
            }
        }

        /**
         * Refrigerant mass flow through the coil.
         *
         * @param kgPerSecond [kg/s]
         */
        record MassFlow(double kgPerSecond) implements Target {
            /** Validates. */
            public MassFlow {
                Check.positive("massFlow", kgPerSecond);
            }
        }

        /**
         * A capacity the coil must deliver; the saturation temperature is solved for, with the
         * outlet superheat (evaporator) or subcooling (condenser) held.
         *
         * @param watts   [W]
         * @param outletK superheat or subcooling held at the outlet [K]
         */
        record Capacity(double watts, double outletK) implements Target {
            /** Validates. */
            public Capacity {
                Check.positive("requiredCapacity", watts);
                Check.within("superheat", outletK, 0, 60);
            }
        }
    }
}
