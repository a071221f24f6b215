package org.finstack.study.compare;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.finstack.coil.CoilCase;
import org.finstack.coil.Rating;
import org.finstack.geometry.CoilGeometry;
import org.finstack.study.Project;
import org.finstack.study.uncertainty.UncertaintyBand;

/**
 * One coil of a comparison: its rating at the project's conditions and everything compared
 * beside it, or the reason it could not be rated. Values SI.
 *
 * @param index            place among the project's entries in the file's order (existing coil first,
 *                         damaged entries at their places; {@link Project#entries()})
 * @param name             the option's name
 * @param existing         whether it is the coil in place
 * @param ratedCase        the case that was rated, or null when the option could not be read (a
 *                         damaged entry of the project file)
 * @param rating           the rating at the project's conditions, or null
 * @param error            why there is no rating, or null
 * @param capacityRatio    capacity over the existing coil's, each at the project's conditions
 *                         (empty without a rated existing coil)
 * @param fan              the fan's operating point with this coil, or null without a fan curve
 * @param pressure         the design-pressure margin, or null when not rated
 * @param charge           charge and charge screen, or null when not rated
 * @param constraintIssues the project's limits this coil breaks, as sentences
 * @param band             the capacity band of the rated case (at the stated airflow), or null when no
 *                         band was asked for or it could not be rated
 * @param bandNote         why a band asked for is missing, or null
 */
public record OptionResult(int index, String name, boolean existing, CoilCase ratedCase, Rating rating, String error,
        OptionalDouble capacityRatio, FanResult fan, PressureResult pressure, ChargeResult charge,
        List<String> constraintIssues, UncertaintyBand band, String bandNote) {

    /** Freezes the list. */
    public OptionResult {
        capacityRatio = capacityRatio == null ? OptionalDouble.empty() : capacityRatio;
        constraintIssues = constraintIssues == null ? List.of() : List.copyOf(constraintIssues);
    }

    /**
     * An option that could not be read or rated.
     *
     * @param index    its place in the project's options
     * @param name     its name
     * @param existing whether it is the coil in place
     * @param error    the reason
     * @return the result
     */
    public static OptionResult failed(int index, String name, boolean existing, String error) {
        return new OptionResult(index, name, existing, null, null, error, OptionalDouble.empty(), null, null, null,
                List.of(), null, null);
    }

    /** @return the 10th percentile of capacity [W], empty without a band */
    public OptionalDouble capacityP10() {
        return band == null ? OptionalDouble.empty() : OptionalDouble.of(band.capacityP10());
    }

    /** @return the 90th percentile of capacity [W], empty without a band */
    public OptionalDouble capacityP90() {
        return band == null ? OptionalDouble.empty() : OptionalDouble.of(band.capacityP90());
    }

    /** @return whether the option was rated */
    public boolean rated() {
        return rating != null;
    }

    /** @return the coil (only when the option was read) */
    public CoilGeometry coil() {
        return ratedCase.coil();
    }

    /** @return the airflow through the coil [m3/s]: the fan's delivered airflow when known, else the stated one */
    public double airflow() {
        return fan != null && fan.found() ? fan.airflow() : rating.airVolumeFlow();
    }

    /** @return the capacity at {@link #airflow()} [W] */
    public double deliveredCapacity() {
        return fan != null && fan.found() ? fan.capacity() : rating.capacity();
    }

    /** @return the air-side pressure drop at {@link #airflow()} [Pa] */
    public double deliveredAirPressureDrop() {
        return fan != null && fan.found() ? fan.rating().airPressureDrop() : rating.airPressureDrop();
    }

    /** @return refrigerant pressure drop through the coil [Pa], empty for the isothermal model */
    public OptionalDouble refrigerantPressureDrop() {
        return rating.refrigerant() == null ? OptionalDouble.empty()
                : OptionalDouble.of(rating.refrigerant().pressureDrop());
    }

    /** @return fall of the saturation (dew-point) temperature through the coil [K], empty for the isothermal model */
    public OptionalDouble saturationTemperaturePenalty() {
        return rating.refrigerant() == null ? OptionalDouble.empty()
                : OptionalDouble.of(rating.refrigerant().saturationTemperatureDrop());
    }

    /** @return refrigerant charge held in the coil [kg], empty when the model does not compute it */
    public OptionalDouble chargeKg() {
        return charge != null && charge.computed() ? OptionalDouble.of(charge.charge()) : OptionalDouble.empty();
    }

    /** @return the margin of the tubes' allowable pressure over the required pressure [-], empty when unknown */
    public OptionalDouble pressureMargin() {
        return pressure != null && pressure.known() ? OptionalDouble.of(pressure.margin().margin())
                : OptionalDouble.empty();
    }

    /**
     * @return the rating's validity warnings, the limits broken, and what could not be worked
     *         out (fan point, pressure margin), as sentences
     */
    public List<String> warnings() {
        List<String> w = new ArrayList<>();
        if (rating != null) {
            w.addAll(rating.warnings());
        }
        w.addAll(constraintIssues);
        if (fan != null && !fan.found()) {
            w.add("Fan curve: " + fan.error());
        }
        if (pressure != null && !pressure.known()) {
            w.add("Design-pressure margin not worked out: " + pressure.error());
        }
        if (bandNote != null) {
            w.add("Capacity band not worked out: " + bandNote);
        }
        return List.copyOf(w);
    }
}
