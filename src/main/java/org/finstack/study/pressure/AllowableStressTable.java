package org.finstack.study.pressure;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;

/**
 * Maximum allowable stresses of tube materials, read once from
 * {@code org/finstack/study/pressure/tube-allowable-stress.json} (shipped inside the jar). The
 * file keeps each value in its source's units (F, psi) and names its source; this class converts
 * to kelvin and pascal on loading.
 *
 * <p>Between listed temperatures the stress is interpolated linearly (the ASME piping codes
 * permit straight-line interpolation between tabulated temperatures, from memory); from the
 * material's lowest service temperature up to the first listed temperature the first value
 * applies. Outside that range the table refuses: allowable stresses are not extrapolated.
 */
public final class AllowableStressTable {

    /** Class-path location of the data file. */
    public static final String RESOURCE = "/org/finstack/study/pressure/tube-allowable-stress.json";

    private static final AllowableStressTable STANDARD = load();

    private final Map<String, Entry> entries;
    private final Map<String, Citation> references;

    private AllowableStressTable(Map<String, Entry> entries, Map<String, Citation> references) {
        this.entries = entries;
        this.references = references;
    }

    /** @return the table shipped with Finstack */
    public static AllowableStressTable standard() {
        return STANDARD;
    }

    /** @return the material ids the table covers, in file order */
    public List<String> materialIds() {
        return List.copyOf(entries.keySet());
    }

    /** @return the references named by the data, by key */
    public Map<String, Citation> references() {
        return references;
    }

    /**
     * @param materialId a material id
     * @return whether the table holds stresses for it
     */
    public boolean covers(String materialId) {
        return entries.containsKey(materialId);
    }

    /**
     * @param materialId a material id the table covers
     * @param temper     the temper asked for
     * @return whether a value for exactly that temper is held (otherwise the annealed value serves)
     */
    public boolean holds(String materialId, Temper temper) {
        return entry(materialId).curves.containsKey(temper);
    }

    /**
     * @param materialId a material id the table covers
     * @return the lowest design temperature the table accepts for it [K]
     */
    public double minTemperature(String materialId) {
        return entry(materialId).minTemperature;
    }

    /**
     * @param materialId a material id the table covers
     * @param temper     the temper
     * @return the highest design temperature the table lists for it [K]
     */
    public double maxTemperature(String materialId, Temper temper) {
        double[] t = curve(entry(materialId), temper).temperatures;
        return t[t.length - 1];
    }

    /**
     * The allowable stress of a material at a design temperature. If no value is held for the
     * drawn temper the annealed value is returned (it is never higher) and the note says so.
     *
     * @param materialId        a material id the table covers
     * @param temper            the temper
     * @param designTemperature design metal temperature [K]
     * @return the stress with its source
     * @throws InputException on field {@code designTemperature} outside the tabulated range, on
     *                        {@code temper} when it is missing
     */
    public AllowableStress stress(String materialId, Temper temper, double designTemperature) {
        if (temper == null) {
            throw new InputException("temper", Msg.MISSING);
        }
        Entry e = entry(materialId);
        Curve c = curve(e, temper);
        Temper used = e.curves.containsKey(temper) ? temper : Temper.ANNEALED;
        Check.finite("designTemperature", designTemperature);
        double max = c.temperatures[c.temperatures.length - 1];
        if (designTemperature < e.minTemperature || designTemperature > max) {
            throw new InputException("designTemperature", Msg.OUT_OF_BOUNDS, designTemperature, e.minTemperature, max);
        }
        String note = c.note;
        if (used != temper) {
            note = "no " + temper.name().toLowerCase(Locale.ROOT) + "-temper value is held for "
                    + materialId + "; the annealed value is used. " + note;
        }
        if (designTemperature < c.temperatures[0]) {
            note = note + ". Below the first tabulated temperature the first value applies; lowest service "
                    + "temperature: " + e.minNote;
        }
        return new AllowableStress(materialId, e.spec, used, interpolate(c, designTemperature), designTemperature,
                c.source, note);
    }

    private Entry entry(String materialId) {
        Entry e = entries.get(materialId);
        if (e == null) {
            throw new InputException("coil.tubeMaterial", Msg.UNKNOWN_NAME, materialId,
                    String.join(", ", entries.keySet()));
        }
        return e;
    }

    private static Curve curve(Entry e, Temper temper) {
        Curve c = e.curves.get(temper);
        return c != null ? c : e.curves.get(Temper.ANNEALED);
    }

    private static double interpolate(Curve c, double t) {
        double[] x = c.temperatures;
        double[] y = c.stresses;
        if (t <= x[0]) {
            return y[0];
        }
        for (int i = 1; i < x.length; i++) {
            if (t <= x[i]) {
                double f = (t - x[i - 1]) / (x[i] - x[i - 1]);
                return y[i - 1] + f * (y[i] - y[i - 1]);
            }
        }
        return y[y.length - 1];
    }

    private static AllowableStressTable load() {
        try (InputStream in = AllowableStressTable.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("allowable-stress table missing from the class path: " + RESOURCE);
            }
            return parse(new ObjectMapper().readTree(in));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the allowable-stress table", e);
        }
    }

    static AllowableStressTable parse(JsonNode root) {
        Map<String, Citation> refs = new LinkedHashMap<>();
        root.path("references").fields().forEachRemaining(e ->
                refs.put(e.getKey(), Citation.of(e.getKey(), e.getValue().asText())));
        Map<String, Entry> entries = new LinkedHashMap<>();
        for (JsonNode n : root.path("materials")) {
            String id = n.path("id").asText();
            Map<Temper, Curve> curves = new EnumMap<>(Temper.class);
            for (Temper t : Temper.values()) {
                JsonNode c = n.path(t.name().toLowerCase(Locale.ROOT));
                if (!c.isMissingNode()) {
                    curves.put(t, curve(id, c, refs));
                }
            }
            if (!curves.containsKey(Temper.ANNEALED)) {
                throw new IllegalStateException("allowable-stress table: " + id + " has no annealed values");
            }
            source(id, n.path("minTemperatureSource").asText(), refs);
            double minT = fahrenheit(n.path("minTemperature_F").asDouble());
            Entry e = new Entry(n.path("spec").asText(), minT, n.path("minTemperatureNote").asText(), curves);
            for (Curve c : curves.values()) {
                if (!(minT <= c.temperatures[0])) {
                    throw new IllegalStateException("allowable-stress table: " + id + " lowest temperature above its first value");
                }
            }
            if (entries.put(id, e) != null) {
                throw new IllegalStateException("allowable-stress table: " + id + " listed twice");
            }
        }
        return new AllowableStressTable(Collections.unmodifiableMap(entries), Collections.unmodifiableMap(refs));
    }

    private static Curve curve(String id, JsonNode c, Map<String, Citation> refs) {
        JsonNode tf = c.path("temperature_F");
        JsonNode sp = c.path("stress_psi");
        if (tf.size() == 0 || tf.size() != sp.size()) {
            throw new IllegalStateException("allowable-stress table: " + id + " temperature and stress lists differ");
        }
        double[] t = new double[tf.size()];
        double[] s = new double[sp.size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = fahrenheit(tf.get(i).asDouble());
            s[i] = Quantities.fromUnit(sp.get(i).asDouble(), Dimension.PRESSURE, "psia");
            if (!(s[i] > 0) || (i > 0 && !(t[i] > t[i - 1]))) {
                throw new IllegalStateException("allowable-stress table: " + id + " needs positive stresses at rising temperatures");
            }
        }
        return new Curve(t, s, source(id, c.path("source").asText(), refs), c.path("note").asText());
    }

    private static double fahrenheit(double f) {
        return Quantities.fromUnit(f, Dimension.TEMPERATURE, "°F");
    }

    private static Citation source(String id, String key, Map<String, Citation> refs) {
        Citation c = refs.get(key);
        if (c == null) {
            throw new IllegalStateException("allowable-stress table: " + id + " names an unknown source '" + key + "'");
        }
        return c;
    }

    private record Curve(double[] temperatures, double[] stresses, Citation source, String note) {
    }

    private record Entry(String spec, double minTemperature, String minNote, Map<Temper, Curve> curves) {
    }
}
