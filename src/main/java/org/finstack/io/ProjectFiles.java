package org.finstack.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.util.RawValue;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.finstack.coil.AirInlet;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.RefrigerantSide;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
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
 * Reads and writes project files (format version 2; version 1, which lacks
 * {@code constraints.room}, is read as it is; the refrigerant object carries the case file's
 * version-2 keys when the conditions use them):
 * <pre>
 * { "version": 2, "name": ..., "conditions": { "air": {...}, "refrigerant": {...}, "fouling": {...} },
 *   "existing": OPTION, "options": [ OPTION, ... ],
 *   "constraints": { "maxFaceWidth", "maxFaceHeight", "maxDepth", "circuits", "requiredCapacity",
 *                    "fanCurve": [ { "volumeFlow": ..., "pressure": ... } ],
 *                    "room": { "volume": "60 m3", "floorArea": "25 m2", "releaseHeight": "1.8 m",
 *                              "selfContainedAppliance": false } },
 *   "notes": "..." }
 * OPTION = { "name": ..., "coil": {...}, "overrides": { any of "air", "refrigerant", "fouling" } }
 * </pre>
 * The {@code coil}, {@code air}, {@code refrigerant} and {@code fouling} objects are exactly those
 * of a case file ({@link CaseFiles}), so parts of any case file can be pasted in. Quantities are
 * read as "number unit" strings or bare SI numbers and written as "number unit" strings in SI
 * units ({@link #quantity}), so a saved project reads back unchanged.
 *
 * <p><b>The room</b> ({@code constraints.room}, optional) is the smallest occupied room a leak of
 * the refrigerant can reach, for the EN 378-1 charge screen of a comparison: its volume, floor
 * area, the release height of the unit above the floor (quantities with units like every other
 * key) and whether the system is a self-contained appliance under IEC 60335-2-89 ({@code true} or
 * {@code false}); all four are required when the room is given. A file with a room is written as
 * version 2; a file without one keeps the version it was read with.
 *
 * <p><b>Damaged entries.</b> The existing coil and each option are read on their own: an entry
 * with a bad value (an impossible coil, a misspelt key, a value without its unit) does not refuse
 * the file but is kept as a {@link Project.Damaged} entry with its error (field and reason) and
 * its original JSON text, and the other options are read. Saving writes a damaged entry back
 * verbatim, at its place, so a file is never lost by opening and saving it. Everything outside the
 * entries (version, name, conditions, constraints, notes) refuses the file when bad, and so does a
 * file in which no entry at all could be read (with the first entry's error).
 *
 * <p>Saving is atomic and keeps the previous file as {@code NAME.bak} ({@link AtomicFiles}).
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
            "requiredCapacity", "fanCurve", "room");
    private static final Set<String> FAN_POINT = Set.of("volumeFlow", "pressure");
    private static final Set<String> ROOM = Set.of("volume", "floorArea", "releaseHeight", "selfContainedAppliance");

    private static final JsonFactory FACTORY = new JsonFactory();
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
        Map<String, String> raw = entryTexts(json);
        Option existing = null;
        List<Project.Damaged> damaged = new ArrayList<>();
        List<InputException> errors = new ArrayList<>();
        if (top.has("existing")) {
            try {
                existing = option(top.object("existing", true));
            } catch (InputException e) {
                errors.add(e);
                damaged.add(damaged("existing", -1, root.get("existing"), e, raw));
            }
        }
        List<Option> options = new ArrayList<>();
        if (top.has("options")) {
            JsonNode list = root.get("options");
            if (!list.isArray()) {
                throw new InputException("options", Msg.IMPOSSIBLE, "must be a JSON list [ ... ]");
            }
            for (int i = 0; i < list.size(); i++) {
                String field = "options[" + i + "]";
                try {
                    options.add(option(new JsonFields(list.get(i), field)));
                } catch (InputException e) {
                    errors.add(e);
                    damaged.add(damaged(field, i, list.get(i), e, raw));
                }
            }
        }
        if (existing == null && options.isEmpty()) {
            if (!errors.isEmpty()) {
                throw errors.get(0);
            }
            throw new InputException("options", Msg.EITHER_REQUIRED, "an existing coil", "at least one option");
        }
        return new Project(version, top.text("name", origin), conditions, existing, options,
                constraints(top.object("constraints", false), root.get("constraints")), top.text("notes", ""),
                damaged);
    }

    private static Project.Damaged damaged(String field, int slot, JsonNode entry, InputException e,
            Map<String, String> raw) {
        JsonNode n = entry == null || !entry.isObject() ? null : entry.get("name");
        String name = n != null && n.isTextual() ? n.asText() : field;
        String text = raw.get(field);
        return new Project.Damaged(field, slot, name, e.getMessage(), text != null ? text : String.valueOf(entry));
    }

    /**
     * The original text of the top-level {@code existing} value and of each element of the
     * top-level {@code options} list, keyed {@code existing} and {@code options[i]}, sliced from
     * the file by the parser's character offsets (called only on text that parsed as a JSON
     * object, so it cannot fail on syntax).
     */
    private static Map<String, String> entryTexts(String json) {
        Map<String, String> out = new HashMap<>();
        try (JsonParser p = FACTORY.createParser(json)) {
            if (p.nextToken() != JsonToken.START_OBJECT) {
                return out;
            }
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String key = p.currentName();
                JsonToken value = p.nextToken();
                if ("existing".equals(key)) {
                    out.put(key, slice(json, p));
                } else if ("options".equals(key) && value == JsonToken.START_ARRAY) {
                    int i = 0;
                    while (p.nextToken() != JsonToken.END_ARRAY) {
                        out.put("options[" + i++ + "]", slice(json, p));
                    }
                } else {
                    p.skipChildren();
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot re-read text that parsed a moment ago", e);
        }
        return out;
    }

    /** The text of the value whose first token the parser is on, leaving the parser on its last token. */
    private static String slice(String json, JsonParser p) throws IOException {
        int start = (int) p.currentTokenLocation().getCharOffset();
        p.skipChildren();
        int end = (int) p.currentLocation().getCharOffset();
        return json.substring(start, end);
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
        Constraints.Room room = c.has("room") ? room(c.object("room", true), raw.get("room")) : null;
        return c.build(() -> new Constraints(limit(c, "maxFaceWidth", Dimension.LENGTH),
                limit(c, "maxFaceHeight", Dimension.LENGTH), limit(c, "maxDepth", Dimension.LENGTH),
                c.has("circuits") ? (int) limitValue(c, "circuits", c.count("circuits")) : 0,
                limit(c, "requiredCapacity", Dimension.HEAT_FLOW), curve, room));
    }

    /**
     * A limit: 0 (not set) when the key is absent, as the writer leaves it out; when given, it must
     * be positive (a written "0 mm" or 0 circuits is an error, not a silent "no limit").
     */
    private static double limit(JsonFields c, String key, Dimension dim) {
        return c.has(key) ? limitValue(c, key, c.quantity(key, dim)) : 0;
    }

    private static double limitValue(JsonFields c, String key, double v) {
        if (!(v > 0)) {
            throw new InputException(c.field(key), Msg.IMPOSSIBLE, "must be greater than zero, got "
                    + Numbers.brief(v) + " (leave the key out for no limit)");
        }
        return v;
    }

    private static Constraints.Room room(JsonFields r, JsonNode raw) {
        r.onlyKeys(ROOM);
        double volume = r.quantity("volume", Dimension.VOLUME);
        double floor = r.quantity("floorArea", Dimension.AREA);
        double height = r.quantity("releaseHeight", Dimension.LENGTH);
        String field = r.field("selfContainedAppliance");
        JsonNode sc = raw.get("selfContainedAppliance");
        if (sc == null || sc.isNull()) {
            throw new InputException(field, Msg.MISSING);
        }
        if (!sc.isBoolean()) {
            throw new InputException(field, Msg.IMPOSSIBLE, "must be true or false, got " + sc);
        }
        return r.build(() -> new Constraints.Room(volume, floor, height, sc.asBoolean()));
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
        root.put("version", versionFor(project));
        root.put("name", project.name());
        ObjectNode cond = root.putObject("conditions");
        Conditions c = project.conditions();
        cond.set("air", air(c.air()));
        cond.set("refrigerant", refrigerant(c.refrigerant()));
        cond.set("fouling", fouling(c.fouling()));
        List<Option> all = project.allOptions();
        ArrayNode options = JsonNodeFactory.instance.arrayNode();
        for (Project.Entry e : project.entries()) {
            if (e.readable() && project.isExisting(e.option())) {
                root.set("existing", option(all.get(e.option())));
            } else if (e.readable()) {
                options.add(option(all.get(e.option())));
            } else if (e.damaged().existing()) {
                root.putRawValue("existing", new RawValue(e.damaged().json()));
            } else {
                options.addRawValue(new RawValue(e.damaged().json()));
            }
        }
        root.set("options", options);
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
            Constraints.Room room = k.room();
            if (room != null) {
                kn.putObject("room").put("volume", quantity(room.volume(), Dimension.VOLUME))
                        .put("floorArea", quantity(room.floorArea(), Dimension.AREA))
                        .put("releaseHeight", quantity(room.releaseHeight(), Dimension.LENGTH))
                        .put("selfContainedAppliance", room.selfContainedAppliance());
            }
        }
        root.put("notes", project.notes());
        try {
            return WRITER.writeValueAsString(root) + System.lineSeparator();
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * @param project a project
     * @return the format version to write it in: 2 when it uses a version-2 key (a room), else the
     *         version it was read with, so a version-1 file stays readable by older copies
     */
    static int versionFor(Project project) {
        int needed = project.constraints().room() != null ? 2 : 1;
        return Math.min(VERSION, Math.max(project.version(), needed));
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
