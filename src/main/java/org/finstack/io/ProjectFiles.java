package org.finstack.io;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.finstack.coil.AirInlet;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.RefrigerantSide;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.geometry.CoilGeometry;
import org.finstack.study.Conditions;
import org.finstack.study.Constraints;
import org.finstack.study.Option;
import org.finstack.study.Overrides;
import org.finstack.study.Project;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/**
 * Reads and writes project files (format version 1; the refrigerant object carries the case
 * file's version-2 keys when the conditions use them):
 * <pre>
 * { "version": 1, "name": ..., "conditions": { "air": {...}, "refrigerant": {...}, "fouling": {...} },
 *   "existing": OPTION, "options": [ OPTION, ... ],
 *   "constraints": { "maxFaceWidth", "maxFaceHeight", "maxDepth", "circuits", "requiredCapacity",
 *                    "fanCurve": [ { "volumeFlow": ..., "pressure": ... } ] },
 *   "notes": "..." }
 * OPTION = { "name": ..., "coil": {...}, "overrides": { any of "air", "refrigerant", "fouling" } }
 * </pre>
 * The {@code coil}, {@code air}, {@code refrigerant} and {@code fouling} objects are exactly those
 * of a case file ({@link CaseFiles}), so parts of any case file can be pasted in. Quantities are
 * read as "number unit" strings or bare SI numbers and written as "number unit" strings in SI
 * units ({@link #quantity}), so a saved project reads back unchanged. Saving is
 * atomic and keeps the previous file as {@code NAME.bak} ({@link AtomicFiles}).
 */
public final class ProjectFiles {

    /** Newest project format version this reader understands. */
    public static final int VERSION = Project.VERSION;

    /** The file name ending of project files. */
    public static final String EXTENSION = ".finstack.json";

    private static final Set<String> TOP = Set.of("version", "name", "conditions", "existing", "options",
            "constraints", "notes");
    private static final Set<String> CONDITIONS = Set.of("air", "refrigerant", "fouling");
    private static final Set<String> OPTION = Set.of("name", "coil", "overrides");
    private static final Set<String> CONSTRAINTS = Set.of("maxFaceWidth", "maxFaceHeight", "maxDepth", "circuits",
            "requiredCapacity", "fanCurve");
    private static final Set<String> FAN_POINT = Set.of("volumeFlow", "pressure");

    private static final ObjectMapper WRITER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ProjectFiles() {
    }

    /**
     * Reads a project file. The file is only read, never changed.
     *
     * @param file the file
     * @return the project
     * @throws InputException naming the field (or the file) and the reason: a damaged file, a
     *                        newer format version, an unknown key or a bad value
     */
    public static Project read(Path file) {
        String text = TextFiles.read(file);
        return parse(text, file.getFileName().toString());
    }

    /**
     * Parses a project from JSON text.
     *
     * @param json   the text
     * @param origin where it came from, for messages
     * @return the project
     */
    public static Project parse(String json, String origin) {
        JsonNode root = CaseFiles.tree(json, origin);
        JsonFields top = new JsonFields(root, "");
        int version = (int) top.number("version", VERSION);
        if (version > VERSION) {
            throw new InputException("version", Msg.NEWER_VERSION, version, VERSION);
        }
        if (version < 1) {
            throw new InputException("version", Msg.NOT_POSITIVE, version);
        }
        top.onlyKeys(TOP);
        JsonFields cond = top.object("conditions", true);
        cond.onlyKeys(CONDITIONS);
        Conditions conditions = new Conditions(CaseFiles.air(cond.object("air", true)),
                CaseFiles.refrigerant(cond.object("refrigerant", true)),
                CaseFiles.fouling(cond.object("fouling", false)));
        Option existing = top.has("existing") ? option(top.object("existing", true)) : null;
        List<Option> options = new ArrayList<>();
        if (top.has("options")) {
            JsonNode list = root.get("options");
            if (!list.isArray()) {
                throw new InputException("options", Msg.IMPOSSIBLE, "must be a JSON list [ ... ]");
            }
            for (int i = 0; i < list.size(); i++) {
                options.add(option(new JsonFields(list.get(i), "options[" + i + "]")));
            }
        }
        if (existing == null && options.isEmpty()) {
            throw new InputException("options", Msg.EITHER_REQUIRED, "an existing coil", "at least one option");
        }
        return new Project(version, top.text("name", origin), conditions, existing, options,
                constraints(top.object("constraints", false), root.get("constraints")), top.text("notes", ""));
    }

    private static Option option(JsonFields o) {
        o.onlyKeys(OPTION);
        CoilGeometry coil = CaseFiles.coil(o.object("coil", true));
        JsonFields ov = o.object("overrides", false);
        Overrides overrides = Overrides.NONE;
        if (ov.present()) {
            ov.onlyKeys(CONDITIONS);
            overrides = new Overrides(ov.has("air") ? CaseFiles.air(ov.object("air", true)) : null,
                    ov.has("refrigerant") ? CaseFiles.refrigerant(ov.object("refrigerant", true)) : null,
                    ov.has("fouling") ? CaseFiles.fouling(ov.object("fouling", true)) : null);
        }
        return new Option(o.text("name"), coil, overrides);
    }

    private static Constraints constraints(JsonFields c, JsonNode raw) {
        if (!c.present()) {
            return Constraints.NONE;
        }
        c.onlyKeys(CONSTRAINTS);
        List<Constraints.FanPoint> curve = new ArrayList<>();
        if (c.has("fanCurve")) {
            JsonNode list = raw.get("fanCurve");
            if (!list.isArray()) {
                throw new InputException(c.field("fanCurve"), Msg.IMPOSSIBLE, "must be a JSON list [ ... ]");
            }
            for (int i = 0; i < list.size(); i++) {
                JsonFields p = new JsonFields(list.get(i), c.field("fanCurve") + "[" + i + "]");
                p.onlyKeys(FAN_POINT);
                curve.add(p.build(() -> new Constraints.FanPoint(p.quantity("volumeFlow", Dimension.VOLUME_FLOW),
                        p.quantity("pressure", Dimension.PRESSURE_DIFFERENCE))));
            }
        }
        return c.build(() -> new Constraints(c.quantity("maxFaceWidth", Dimension.LENGTH, 0),
                c.quantity("maxFaceHeight", Dimension.LENGTH, 0), c.quantity("maxDepth", Dimension.LENGTH, 0),
                c.has("circuits") ? c.count("circuits") : 0, c.quantity("requiredCapacity", Dimension.HEAT_FLOW, 0),
                curve));
    }

    /**
     * Saves a project atomically, keeping the previous file as {@code NAME.bak}.
     *
     * @param file    where to save
     * @param project the project
     * @throws UncheckedIOException when the file cannot be written (the old file is then unchanged)
     */
    public static void write(Path file, Project project) {
        try {
            AtomicFiles.write(file, toJson(project).getBytes(StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot save " + file + ": " + e.getMessage(), e);
        }
    }

    /**
     * @param project a project
     * @return its JSON text (SI quantities as "number unit" strings)
     */
    public static String toJson(Project project) {
        ObjectNode root = JsonNodeFactory.instance.objectNode();
        root.put("version", VERSION);
        root.put("name", project.name());
        ObjectNode cond = root.putObject("conditions");
        Conditions c = project.conditions();
        cond.set("air", air(c.air()));
        cond.set("refrigerant", refrigerant(c.refrigerant()));
        cond.set("fouling", fouling(c.fouling()));
        if (project.existing() != null) {
            root.set("existing", option(project.existing()));
        }
        ArrayNode options = root.putArray("options");
        project.options().forEach(o -> options.add(option(o)));
        Constraints k = project.constraints();
        if (!k.equals(Constraints.NONE)) {
            ObjectNode kn = root.putObject("constraints");
            putIfSet(kn, "maxFaceWidth", k.maxFaceWidth(), Dimension.LENGTH);
            putIfSet(kn, "maxFaceHeight", k.maxFaceHeight(), Dimension.LENGTH);
            putIfSet(kn, "maxDepth", k.maxDepth(), Dimension.LENGTH);
            if (k.circuits() > 0) {
                kn.put("circuits", k.circuits());
            }
            putIfSet(kn, "requiredCapacity", k.requiredCapacity(), Dimension.HEAT_FLOW);
            if (!k.fanCurve().isEmpty()) {
                ArrayNode curve = kn.putArray("fanCurve");
                for (Constraints.FanPoint p : k.fanCurve()) {
                    curve.addObject().put("volumeFlow", quantity(p.volumeFlow(), Dimension.VOLUME_FLOW))
                            .put("pressure", quantity(p.pressure(), Dimension.PRESSURE_DIFFERENCE));
                }
            }
        }
        root.put("notes", project.notes());
        try {
            return WRITER.writeValueAsString(root) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void putIfSet(ObjectNode n, String key, double v, Dimension d) {
        if (v > 0) {
            n.put(key, quantity(v, d));
        }
    }

    private static ObjectNode option(Option o) {
        ObjectNode n = JsonNodeFactory.instance.objectNode();
        n.put("name", o.name());
        n.set("coil", coil(o.coil()));
        Overrides ov = o.overrides();
        if (!ov.isEmpty()) {
            ObjectNode on = n.putObject("overrides");
            if (ov.air() != null) {
                on.set("air", air(ov.air()));
            }
            if (ov.refrigerant() != null) {
                on.set("refrigerant", refrigerant(ov.refrigerant()));
            }
            if (ov.fouling() != null) {
                on.set("fouling", fouling(ov.fouling()));
            }
        }
        return n;
    }

    /**
     * @param g a coil
     * @return its case-file object, SI quantities as "number unit" strings
     */
    public static ObjectNode coil(CoilGeometry g) {
        ObjectNode n = JsonNodeFactory.instance.objectNode();
        n.put("tubeOuterDiameter", quantity(g.tubeOuterDiameter(), Dimension.LENGTH));
        n.put("tubeWall", quantity(g.tubeWall(), Dimension.LENGTH));
        n.put("tubeMaterial", g.tubeMaterial().id());
        n.put("arrangement", g.arrangement().id());
        n.put("transversePitch", quantity(g.transversePitch(), Dimension.LENGTH));
        n.put("rowPitch", quantity(g.rowPitch(), Dimension.LENGTH));
        n.put("rows", g.rows());
        n.put("tubesPerRow", g.tubesPerRow());
        n.put("finnedLength", quantity(g.finnedLength(), Dimension.LENGTH));
        n.put("finType", g.finType());
        n.put("finPitch", quantity(g.finPitch(), Dimension.FIN_PITCH));
        n.put("finThickness", quantity(g.finThickness(), Dimension.LENGTH));
        n.put("finMaterial", g.finMaterial().id());
        n.put("circuits", g.circuits());
        if (g.coating() != null) {
            n.put("coating", g.coating().id());
            n.put("coatingThickness", quantity(g.coatingThickness(), Dimension.LENGTH));
        }
        return n;
    }

    /**
     * @param a entering air
     * @return its case-file object
     */
    public static ObjectNode air(AirInlet a) {
        ObjectNode n = JsonNodeFactory.instance.objectNode();
        n.put("inletTemperature", quantity(a.temperature(), Dimension.TEMPERATURE));
        if (a.faceVelocity() > 0) {
            n.put("faceVelocity", quantity(a.faceVelocity(), Dimension.VELOCITY));
        } else {
            n.put("volumeFlow", quantity(a.volumeFlow(), Dimension.VOLUME_FLOW));
        }
        n.put("pressure", quantity(a.pressure(), Dimension.PRESSURE));
        n.put("relativeHumidity", a.relativeHumidity());
        return n;
    }

    /**
     * @param r a refrigerant side
     * @return its case-file object
     */
    public static ObjectNode refrigerant(RefrigerantSide r) {
        ObjectNode n = JsonNodeFactory.instance.objectNode();
        n.put("fluid", r.fluid());
        n.put("duty", r.duty().id());
        n.put("saturationTemperature", quantity(r.saturationTemperature(), Dimension.TEMPERATURE));
        if (r.convention() != RefrigerantSide.SaturationConvention.DEW) {
            n.put("saturationConvention", r.convention().name().toLowerCase(java.util.Locale.ROOT));
        }
        if (r.insideCoefficient() > 0 || r.model() == RefrigerantSide.Model.ISOTHERMAL) {
            n.put("insideCoefficient", quantity(r.insideCoefficient(), Dimension.HEAT_TRANSFER_COEFFICIENT));
        }
        if (r.liquidTemperature() > 0) {
            n.put("liquidTemperature", quantity(r.liquidTemperature(), Dimension.TEMPERATURE));
        }
        if (r.inletTemperature() > 0) {
            n.put("inletTemperature", quantity(r.inletTemperature(), Dimension.TEMPERATURE));
        }
        String held = r.duty() == org.finstack.coil.Duty.EVAPORATOR ? "superheat" : "subcooling";
        RefrigerantSide.Target t = r.target();
        if (t instanceof RefrigerantSide.Target.Superheat s) {
            n.put("superheat", quantity(s.kelvin(), Dimension.TEMPERATURE_DIFFERENCE));
        } else if (t instanceof RefrigerantSide.Target.Subcooling s) {
            n.put("subcooling", quantity(s.kelvin(), Dimension.TEMPERATURE_DIFFERENCE));
        } else if (t instanceof RefrigerantSide.Target.MassFlow m) {
            n.put("massFlow", quantity(m.kgPerSecond(), Dimension.MASS_FLOW));
        } else if (t instanceof RefrigerantSide.Target.Capacity c) {
            n.put(held, quantity(c.outletK(), Dimension.TEMPERATURE_DIFFERENCE));
            n.put("requiredCapacity", quantity(c.watts(), Dimension.HEAT_FLOW));
        }
        // the reader infers the isothermal model without a target and the zone model with one
        RefrigerantSide.Model inferred = t instanceof RefrigerantSide.Target.None ? RefrigerantSide.Model.ISOTHERMAL
                : RefrigerantSide.Model.ZONES;
        if (r.model() != inferred) {
            n.put("model", r.model().id());
        }
        if (r.segments() != DEFAULT_SEGMENTS) {
            n.put("segments", r.segments());
        }
        return n;
    }

    /** Segments per tube the case-file reader assumes when none are given ({@link CaseFiles}). */
    private static final int DEFAULT_SEGMENTS = 10;

    /**
     * @param f added resistances
     * @return their case-file object
     */
    public static ObjectNode fouling(FoulingResistances f) {
        ObjectNode n = JsonNodeFactory.instance.objectNode();
        n.put("airSide", quantity(f.airSide(), Dimension.FOULING_RESISTANCE));
        n.put("inside", quantity(f.inside(), Dimension.FOULING_RESISTANCE));
        n.put("contact", quantity(f.contact(), Dimension.FOULING_RESISTANCE));
        return n;
    }

    /**
     * Writes an SI value as "number unit": in the SI display unit of its dimension (mm, °C, kPa,
     * ...) when the shortest decimal there reads back as the very same double, else in the base
     * SI unit with the shortest decimal that reads back exactly. So 9.52 mm is written
     * {@code "9.52 mm"}, and every saved value reads back unchanged.
     *
     * @param si  the value [SI unit of {@code dim}]
     * @param dim what it is
     * @return the text
     */
    public static String quantity(double si, Dimension dim) {
        if (!Double.isFinite(si)) {
            throw new InputException("value", Msg.NOT_A_NUMBER, si);
        }
        String unit = Quantities.defaultUnit(dim, UnitSystem.SI);
        if (!"-".equals(unit) && !(dim == Dimension.FIN_PITCH && si <= 0)) {
            String text = decimal(Quantities.toUnit(si, dim, unit)) + " " + unit;
            if (Quantities.parse("value", text, dim) == si) {
                return text;
            }
        }
        return decimal(si) + " " + dim.siUnit();
    }

    private static String decimal(double v) {
        return v == 0 ? "0" : BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}
