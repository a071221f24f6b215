package org.finstack.io;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.finstack.coil.AirInlet;
import org.finstack.coil.CoilCase;
import org.finstack.coil.Duty;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.Circuiting;
import org.finstack.coil.RefrigerantSide;
import org.finstack.coil.RefrigerantSide.Model;
import org.finstack.coil.RefrigerantSide.SaturationConvention;
import org.finstack.coil.RefrigerantSide.Target;
import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.fluid.Fluids;
import org.finstack.geometry.Arrangement;
import org.finstack.geometry.CoilGeometry;
import org.finstack.material.Coating;
import org.finstack.material.Materials;
import org.finstack.units.Dimension;

/**
 * Reads case files (format versions 1 and 2; version 1 files keep their meaning). A case is one JSON object with the parts {@code coil},
 * {@code air}, {@code refrigerant} and optionally {@code fouling}; quantities are strings
 * "number unit" or bare SI numbers. Every error names the field by its dotted path.
 *
 * <p>Fin-pattern keys in {@code coil} (lengths), required by the fin type named in
 * {@code finType} and refused for any other:
 * <ul>
 * <li>{@code "finType": "wavy"} (herringbone): {@code "waveHeight"}, the wave height Pd, peak to
 * valley without the fin thickness; {@code "waveLength"}, the projected length Xf of
 * <em>half</em> a wave measured in the air-flow direction, as Wang et al. define it for wavy
 * fins (so the corrugation angle is atan(Pd / Xf)).</li>
 * <li>{@code "finType": "louvered"}: {@code "louverPitch"}, the louver pitch Lp in the air-flow
 * direction; {@code "louverHeight"}, the louver height Lh.</li>
 * </ul>
 * A plain fin takes none of them.
 */
public final class CaseFiles {

    /** Newest case-file format version this reader understands. */
    public static final int VERSION = 2;

    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(DeserializationFeature.FAIL_ON_READING_DUP_TREE_KEY)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS);

    private static final Set<String> TOP = Set.of("version", "name", "description", "coil", "air",
            "refrigerant", "fouling", "fan");
    private static final Set<String> COIL = Set.of("tubeOuterDiameter", "tubeWall", "tubeMaterial", "arrangement",
            "transversePitch", "rowPitch", "rows", "tubesPerRow", "finnedLength", "finType", "finPitch",
            "finThickness", "finMaterial", "circuits", "coating", "coatingThickness", "circuiting", "waveHeight", "waveLength",
            "louverPitch", "louverHeight");
    private static final Set<String> AIR = Set.of("inletTemperature", "faceVelocity", "volumeFlow", "pressure",
            "relativeHumidity", "faceVelocityProfile");
    private static final Set<String> REFRIGERANT = Set.of("fluid", "duty", "saturationTemperature",
            "saturationConvention", "insideCoefficient", "liquidTemperature", "inletTemperature", "superheat",
            "subcooling", "massFlow", "requiredCapacity", "model", "segments");
    private static final Set<String> FOULING = Set.of("airSide", "inside", "contact");

    /** Standard atmosphere [Pa] (ISO 2533; NIST SP 811 Appendix B), the default barometric pressure. */
    static final double STANDARD_ATMOSPHERE = 101_325.0;

    private CaseFiles() {
    }

    /**
     * Reads a case file.
     *
     * @param file the file
     * @return the case
     * @throws InputException naming the field (or the file) and the reason
     */
    public static CoilCase read(Path file) {
        String text = TextFiles.read(file);
        return parse(text, file.getFileName().toString());
    }

    /**
     * Parses a case from JSON text.
     *
     * @param json   the text
     * @param origin where it came from, for messages (e.g. the file name)
     * @return the case
     */
    public static CoilCase parse(String json, String origin) {
        return read(tree(json, origin));
    }

    static JsonNode tree(String json, String origin) {
        try {
            JsonNode root = MAPPER.readTree(json);
            if (root == null || root.isMissingNode()) {
                throw new InputException(origin, Msg.MALFORMED_FILE, "the file is empty");
            }
            if (!root.isObject()) {
                throw new InputException(origin, Msg.IMPOSSIBLE, "must be a JSON object { ... }, not "
                        + root.getNodeType().name().toLowerCase(Locale.ROOT));
            }
            return root;
        } catch (JsonProcessingException e) {
            String where = e.getLocation() == null ? ""
                    : " (line " + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr() + ")";
            throw new InputException(origin, Msg.MALFORMED_FILE, e.getOriginalMessage() + where);
        }
    }

    /**
     * Reads a case from a parsed JSON tree.
     *
     * @param root the case object
     * @return the case
     */
    public static CoilCase read(JsonNode root) {
        JsonFields top = new JsonFields(root, "");
        top.onlyKeys(TOP);
        int version = (int) top.number("version", VERSION);
        if (version > VERSION) {
            throw new InputException("version", Msg.NEWER_VERSION, version, VERSION);
        }
        if (version < 1) {
            throw new InputException("version", Msg.NOT_POSITIVE, version);
        }
        JsonFields coilFields = top.object("coil", true);
        JsonFields airFields = top.object("air", true);
        CoilGeometry coil = coil(coilFields);
        Circuiting circuiting = coilFields.has("circuiting")
                ? coilFields.build(() -> Circuiting.parse(coil.rows(), coil.tubesPerRow(), coilFields.textLists("circuiting")))
                : null;
        List<Double> profile = airFields.has("faceVelocityProfile") ? airFields.numbers("faceVelocityProfile") : List.of();
        return new CoilCase(coil, air(airFields), refrigerant(top.object("refrigerant", true)),
                fouling(top.object("fouling", false)), circuiting, profile);
    }

    /**
     * Reads a coil object.
     *
     * @param c the {@code coil} fields
     * @return the geometry
     */
    static CoilGeometry coil(JsonFields c) {
        c.onlyKeys(COIL);
        Materials lib = Materials.library();
        Coating coating = c.has("coating") ? lib.coating(c.field("coating"), c.text("coating")) : null;
        double coatingThickness = coating == null ? c.quantity("coatingThickness", Dimension.LENGTH, 0)
                : c.quantity("coatingThickness", Dimension.LENGTH, coating.typicalThickness());
        return c.build(() -> new CoilGeometry(c.quantity("tubeOuterDiameter", Dimension.LENGTH),
                        c.quantity("tubeWall", Dimension.LENGTH),
                        lib.tube(c.field("tubeMaterial"), c.text("tubeMaterial")),
                        Arrangement.parse(c.field("arrangement"), c.text("arrangement", "staggered")),
                        c.quantity("transversePitch", Dimension.LENGTH), c.quantity("rowPitch", Dimension.LENGTH),
                        c.count("rows"), c.count("tubesPerRow"), c.quantity("finnedLength", Dimension.LENGTH),
                        c.text("finType", "plain").strip().toLowerCase(java.util.Locale.ROOT),
                        c.quantity("finPitch", Dimension.FIN_PITCH), c.quantity("finThickness", Dimension.LENGTH),
                        lib.fin(c.field("finMaterial"), c.text("finMaterial")), c.has("circuits") ? c.count("circuits") : 1,
                        coating, coatingThickness,
                        new CoilGeometry.FinPattern(c.quantity("waveHeight", Dimension.LENGTH, 0),
                                c.quantity("waveLength", Dimension.LENGTH, 0),
                                c.quantity("louverPitch", Dimension.LENGTH, 0),
                                c.quantity("louverHeight", Dimension.LENGTH, 0))));
    }

    static AirInlet air(JsonFields a) {
        a.onlyKeys(AIR);
        return a.build(() -> new AirInlet(a.quantity("inletTemperature", Dimension.TEMPERATURE),
                        a.quantity("faceVelocity", Dimension.VELOCITY, 0), a.quantity("volumeFlow", Dimension.VOLUME_FLOW, 0),
                        a.quantity("pressure", Dimension.PRESSURE, STANDARD_ATMOSPHERE), a.number("relativeHumidity", 0)));
    }

    static RefrigerantSide refrigerant(JsonFields r) {
        r.onlyKeys(REFRIGERANT);
        Duty duty = Duty.parse(r.field("duty"), r.text("duty"));
        Target target = target(r, duty);
        Model model = target instanceof Target.None ? Model.ISOTHERMAL : Model.ZONES;
        if (r.has("model")) {
            model = choice(r, "model", Model.values(), Model::id);
        }
        SaturationConvention convention = r.has("saturationConvention")
                ? choice(r, "saturationConvention", SaturationConvention.values(), c -> c.name().toLowerCase(Locale.ROOT))
                : SaturationConvention.DEW;
        Model chosen = model;
        // refused where the file is read, not at the first rating (a project's conditions are shared
        // by every option: each would be listed as not rated and the file accepted)
        Fluids.known(r.field("fluid"), r.text("fluid"));
        return r.build(() -> new RefrigerantSide(r.text("fluid"), duty,
                r.quantity("saturationTemperature", Dimension.TEMPERATURE), convention,
                // absent: 0, the model's correlation; given, it must be a film coefficient (0 is not one)
                r.has("insideCoefficient") ? Check.positive(r.field("insideCoefficient"),
                        r.quantity("insideCoefficient", Dimension.HEAT_TRANSFER_COEFFICIENT)) : 0,
                r.quantity("liquidTemperature", Dimension.TEMPERATURE, 0),
                r.quantity("inletTemperature", Dimension.TEMPERATURE, 0), target, chosen,
                r.has("segments") ? r.count("segments") : 10));
    }

    /** Exactly one of superheat, subcooling, massFlow; requiredCapacity goes with superheat or subcooling. */
    private static Target target(JsonFields r, Duty duty) {
        String held = duty == Duty.EVAPORATOR ? "superheat" : "subcooling";
        String other = duty == Duty.EVAPORATOR ? "subcooling" : "superheat";
        if (r.has(other)) {
            throw new InputException(r.field(other), Msg.IMPOSSIBLE, "applies to " + (duty == Duty.EVAPORATOR
                    ? "condensers" : "evaporators") + "; give the " + duty.id() + "'s " + held);
        }
        boolean hasHeld = r.has(held);
        if (r.has("massFlow") && (hasHeld || r.has("requiredCapacity"))) {
            throw new InputException(r.field("massFlow"), Msg.EXCLUSIVE, "massFlow",
                    hasHeld ? held : "requiredCapacity");
        }
        double k = hasHeld ? r.quantity(held, Dimension.TEMPERATURE_DIFFERENCE) : 0;
        if (r.has("requiredCapacity")) {
            if (!hasHeld) {
                throw new InputException(r.field(held), Msg.IMPOSSIBLE,
                        "is needed with requiredCapacity: it is held while the saturation temperature is solved");
            }
            double q = r.quantity("requiredCapacity", Dimension.HEAT_FLOW);
            return r.build(() -> new Target.Capacity(q, k));
        }
        if (r.has("massFlow")) {
            double m = r.quantity("massFlow", Dimension.MASS_FLOW);
            return r.build(() -> new Target.MassFlow(m));
        }
        if (hasHeld) {
            return r.build(() -> duty == Duty.EVAPORATOR ? new Target.Superheat(k) : new Target.Subcooling(k));
        }
        return new Target.None();
    }

    private static <E> E choice(JsonFields r, String key, E[] values, java.util.function.Function<E, String> id) {
        String text = r.text(key).strip();
        for (E v : values) {
            if (id.apply(v).equalsIgnoreCase(text)) {
                return v;
            }
        }
        throw new InputException(r.field(key), Msg.UNKNOWN_NAME, text,
                java.util.Arrays.stream(values).map(id).collect(java.util.stream.Collectors.joining(", ")));
    }

    static FoulingResistances fouling(JsonFields f) {
        if (!f.present()) {
            return FoulingResistances.NONE;
        }
        f.onlyKeys(FOULING);
        return f.build(() -> new FoulingResistances(f.quantity("airSide", Dimension.FOULING_RESISTANCE, 0),
                        f.quantity("inside", Dimension.FOULING_RESISTANCE, 0),
                        f.quantity("contact", Dimension.FOULING_RESISTANCE, 0)));
    }
}
