package org.finstack.io;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.finstack.coil.AirInlet;
import org.finstack.coil.Circuiting;
import org.finstack.coil.CoilCase;
import org.finstack.coil.Duty;
import org.finstack.coil.RefrigerantSide;
import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.geometry.CoilGeometry;
import org.finstack.study.diagnosis.CleaningInputs;
import org.finstack.study.diagnosis.Measurements;
import org.finstack.study.diagnosis.Reading;
import org.finstack.units.Dimension;

/**
 * Reads measurement files for {@code finstack diagnose}: a case file's {@code coil},
 * {@code refrigerant} and {@code fouling} parts (read as in {@link CaseFiles}), plus
 * <ul>
 * <li>{@code measured}: {@code airInletTemperature}, {@code airOutletTemperature},
 *     {@code airInletRelativeHumidity} (evaporators; optional for condensers),
 *     {@code volumeFlow} (at the entering state), {@code saturationTemperature} (dew point from
 *     the suction or discharge pressure), {@code superheat} (evaporator) or {@code subcooling}
 *     (condenser); optional {@code airOutletRelativeHumidity} (then the total duty is matched,
 *     else the sensible), {@code massFlow} (refrigerant, a cross-check) and {@code airPressureDrop}
 *     (static pressure difference across the coil at the measured airflow, e.g. from a manometer
 *     across the coil, {@code "85 Pa"} or {@code "0.34 in. w.c."}; when given, the dust deposit
 *     level is also inferred from its rise over the clean coil's). Each is a quantity
 *     ({@code "24.5 C"}, or a bare SI number) or {@code { "value": ..., "accuracy": ... }}. The
 *     accuracy is the instrument's stated limit ±a in the value's unit (a temperature's as a
 *     difference, e.g. {@code "0.5 K"}), read as a rectangular distribution (standard uncertainty
 *     a / sqrt 3); for airflow and mass flow it may be a percentage of the value
 *     ({@code "10 %"}), and so for the air pressure drop; for a relative humidity a percentage is in humidity points
 *     ({@code "3 %"} is ±0.03).</li>
 * <li>{@code air} (optional): only {@code pressure} (barometric, default 101 325 Pa) and
 *     {@code faceVelocityProfile}; the entering state and airflow are readings.</li>
 * <li>{@code cleaning} (optional, for the payback): {@code cost} (one cleaning, in the currency),
 *     {@code currency} (a label), {@code energyPrice} (currency per kWh), {@code runHours}
 *     (compressor hours per year), {@code secondLawEfficiency} (the plant's eta_II, 0..1), and the
 *     plant's other saturation temperature: {@code condensingTemperature} when the coil is an
 *     evaporator, {@code evaporatingTemperature} when it is a condenser.</li>
 * </ul>
 * The refrigerant part names the fluid, the duty, and the liquid temperature (evaporator) or
 * the entering gas temperature (condenser); its saturation temperature, superheat or
 * subcooling are readings and belong under {@code measured}. The air-side fouling is what is
 * inferred and is refused in the {@code fouling} part.
 */
public final class MeasurementFiles {

    private static final Set<String> TOP = Set.of("version", "name", "description", "coil", "air", "refrigerant",
            "fouling", "measured", "cleaning");
    private static final Set<String> AIR = Set.of("pressure", "faceVelocityProfile");
    private static final Set<String> MEASURED = Set.of("airInletTemperature", "airOutletTemperature",
            "airInletRelativeHumidity", "airOutletRelativeHumidity", "volumeFlow", "saturationTemperature", "superheat",
            "subcooling", "massFlow", "airPressureDrop");
    private static final Set<String> READINGS_IN_REFRIGERANT = Set.of("saturationTemperature", "superheat", "subcooling",
            "massFlow", "requiredCapacity");
    private static final Set<String> VALUE = Set.of("value", "accuracy");

    private MeasurementFiles() {
    }

    /**
     * What a measurement file holds.
     *
     * @param name         the file's name field, or empty
     * @param template     the coil, refrigerant and fouling parts as a case at the measured conditions
     * @param measurements the readings
     * @param cleaning     the payback inputs, or {@code null}
     */
    public record MeasurementFile(String name, CoilCase template, Measurements measurements, CleaningInputs cleaning) {
    }

    /**
     * @param file the file
     * @return its contents
     * @throws InputException naming the field (or the file) and the reason
     */
    public static MeasurementFile read(Path file) {
        String text = TextFiles.read(file);
        return parse(text, file.getFileName().toString());
    }

    /**
     * @param json   the text
     * @param origin where it came from, for messages
     * @return its contents
     */
    public static MeasurementFile parse(String json, String origin) {
        JsonNode root = CaseFiles.tree(json, origin);
        JsonFields top = new JsonFields(root, "");
        top.onlyKeys(TOP);
        int version = (int) top.number("version", CaseFiles.VERSION);
        if (version > CaseFiles.VERSION) {
            throw new InputException("version", Msg.NEWER_VERSION, version, CaseFiles.VERSION);
        }
        JsonFields coilFields = top.object("coil", true);
        CoilGeometry coil = CaseFiles.coil(coilFields);
        Circuiting circuiting = coilFields.has("circuiting")
                ? coilFields.build(() -> Circuiting.parse(coil.rows(), coil.tubesPerRow(), coilFields.textLists("circuiting")))
                : null;
        JsonFields airFields = top.object("air", false);
        airFields.onlyKeys(AIR);
        double pressure = airFields.quantity("pressure", Dimension.PRESSURE, CaseFiles.STANDARD_ATMOSPHERE);
        List<Double> profile = airFields.has("faceVelocityProfile") ? airFields.numbers("faceVelocityProfile") : List.of();

        if (!root.hasNonNull("refrigerant")) {
            throw new InputException("refrigerant", Msg.MISSING);
        }
        if (!root.get("refrigerant").isObject()) {
            throw new InputException("refrigerant", Msg.IMPOSSIBLE, "must be a JSON object { ... }");
        }
        ObjectNode refNode = ((ObjectNode) root.get("refrigerant")).deepCopy();
        for (String k : READINGS_IN_REFRIGERANT) {
            if (refNode.hasNonNull(k)) {
                throw new InputException("refrigerant." + k, Msg.IMPOSSIBLE, k.equals("requiredCapacity")
                        ? "has no place in a measurement file: the capacity is what is measured"
                        : "is a reading: give it as measured." + k);
            }
        }
        Duty duty = Duty.parse("refrigerant.duty", new JsonFields(refNode, "refrigerant").text("duty"));
        if (!root.hasNonNull("measured")) {
            throw new InputException("measured", Msg.MISSING);
        }
        JsonNode measured = root.get("measured");
        if (!measured.isObject()) {
            throw new InputException("measured", Msg.IMPOSSIBLE, "must be a JSON object { ... }");
        }
        new JsonFields(measured, "measured").onlyKeys(MEASURED);
        String held = duty == Duty.EVAPORATOR ? "superheat" : "subcooling";
        String other = duty == Duty.EVAPORATOR ? "subcooling" : "superheat";
        if (measured.hasNonNull(other)) {
            throw new InputException("measured." + other, Msg.IMPOSSIBLE, "applies to " + (duty == Duty.EVAPORATOR
                    ? "condensers" : "evaporators") + "; give the " + duty.id() + "'s " + held);
        }
        Measurements m = new Measurements(duty,
                reading(measured, "airInletTemperature", Dimension.TEMPERATURE),
                reading(measured, "airOutletTemperature", Dimension.TEMPERATURE),
                reading(measured, "airInletRelativeHumidity", Dimension.DIMENSIONLESS),
                reading(measured, "airOutletRelativeHumidity", Dimension.DIMENSIONLESS),
                reading(measured, "volumeFlow", Dimension.VOLUME_FLOW),
                reading(measured, "saturationTemperature", Dimension.TEMPERATURE),
                reading(measured, held, Dimension.TEMPERATURE_DIFFERENCE),
                reading(measured, "massFlow", Dimension.MASS_FLOW), pressure,
                reading(measured, "airPressureDrop", Dimension.PRESSURE_DIFFERENCE));
        refNode.put("saturationTemperature", m.saturationTemperature().value());
        refNode.put(held, m.outletCondition().value());
        RefrigerantSide refrigerant = CaseFiles.refrigerant(new JsonFields(refNode, "refrigerant"));
        var fouling = CaseFiles.fouling(top.object("fouling", false));
        if (fouling.airSide() != 0) {
            throw new InputException("fouling.airSide", Msg.IMPOSSIBLE,
                    "is what diagnose infers from the readings; leave it out of a measurement file");
        }
        AirInlet air = new AirInlet(m.airInletTemperature().value(), 0, m.volumeFlow().value(), pressure,
                m.airInletRelativeHumidity().value());
        CoilCase template = new CoilCase(coil, air, refrigerant, fouling, circuiting, profile);
        CleaningInputs cleaning = cleaning(top.object("cleaning", false), duty);
        String name = root.hasNonNull("name") ? root.get("name").asText() : "";
        return new MeasurementFile(name, template, m, cleaning);
    }

    /** A quantity, or { "value": quantity, "accuracy": quantity or percentage }; null when absent. */
    private static Reading reading(JsonNode measured, String key, Dimension dim) {
        if (!measured.hasNonNull(key)) {
            return null;
        }
        String field = "measured." + key;
        JsonNode v = measured.get(key);
        if (!v.isObject()) {
            return new Reading(value(v, field, dim), 0);
        }
        new JsonFields(v, field).onlyKeys(VALUE);
        if (!v.hasNonNull("value")) {
            throw new InputException(field + ".value", Msg.MISSING);
        }
        double value = value(v.get("value"), field + ".value", dim);
        double accuracy = 0;
        if (v.hasNonNull("accuracy")) {
            JsonNode a = v.get("accuracy");
            String af = field + ".accuracy";
            if (a.isTextual() && a.asText().strip().endsWith("%")
                    && (dim == Dimension.VOLUME_FLOW || dim == Dimension.MASS_FLOW
                            || dim == Dimension.PRESSURE_DIFFERENCE)) {
                String number = a.asText().strip();
                accuracy = Math.abs(value) * JsonFields.quantityValue(
                        com.fasterxml.jackson.databind.node.TextNode.valueOf(number), af, Dimension.DIMENSIONLESS);
            } else {
                Dimension ad = dim == Dimension.TEMPERATURE ? Dimension.TEMPERATURE_DIFFERENCE : dim;
                accuracy = JsonFields.quantityValue(a, af, ad);
            }
            Check.nonNegative(af, accuracy);
        }
        return new Reading(value, accuracy);
    }

    private static double value(JsonNode v, String field, Dimension dim) {
        return JsonFields.quantityValue(v, field, dim);
    }

    private static CleaningInputs cleaning(JsonFields c, Duty duty) {
        if (!c.present()) {
            return null;
        }
        String other = duty == Duty.EVAPORATOR ? "condensingTemperature" : "evaporatingTemperature";
        c.onlyKeys(Set.of("cost", "currency", "energyPrice", "runHours", "secondLawEfficiency", other));
        double otherT = c.quantity(other, Dimension.TEMPERATURE);
        Check.within(c.field(other), otherT, 173.15, 373.15);
        for (String k : List.of("cost", "energyPrice", "runHours", "secondLawEfficiency")) {
            if (!c.has(k)) {
                throw new InputException(c.field(k), Msg.MISSING);
            }
        }
        return new CleaningInputs(c.number("cost", 0), c.text("currency"), c.number("energyPrice", 0),
                c.number("runHours", 0), c.number("secondLawEfficiency", 0), otherT);
    }
}
