package org.finstack.study.pressure;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * Safety class, LFL and practical limit of common refrigerants, read once from
 * {@code org/finstack/study/pressure/refrigerant-safety.json}. Every entry names its source; most
 * values are recalled from ASHRAE 34 / ISO 817 and EN 378-1 Annex E and marked "from memory" in
 * the file, to be checked against the editions in force. Designations are matched without regard
 * to case, spaces or a hyphen after the R ({@code r-290}, {@code R 290}, {@code R290}).
 */
public final class RefrigerantSafetyTable {

    /** Class-path location of the data file. */
    public static final String RESOURCE = "/org/finstack/study/pressure/refrigerant-safety.json";

    private static final RefrigerantSafetyTable STANDARD = load();

    private final Map<String, RefrigerantSafety> byKey;
    private final List<RefrigerantSafety> all;
    private final Map<String, Citation> references;

    private RefrigerantSafetyTable(Map<String, RefrigerantSafety> byKey, List<RefrigerantSafety> all,
            Map<String, Citation> references) {
        this.byKey = byKey;
        this.all = all;
        this.references = references;
    }

    /** @return the table shipped with Finstack */
    public static RefrigerantSafetyTable standard() {
        return STANDARD;
    }

    /** @return every refrigerant, in file order */
    public List<RefrigerantSafety> refrigerants() {
        return all;
    }

    /** @return the references named by the data, by key */
    public Map<String, Citation> references() {
        return references;
    }

    /**
     * @param field       the input field, for messages
     * @param designation a refrigerant designation, e.g. {@code R-1234ze(E)}
     * @return its safety data
     * @throws InputException {@link Msg#UNKNOWN_NAME} if the table does not hold it
     */
    public RefrigerantSafety find(String field, String designation) {
        RefrigerantSafety r = byKey.get(key(designation));
        if (r == null) {
            throw new InputException(field, Msg.UNKNOWN_NAME, designation,
                    String.join(", ", all.stream().map(RefrigerantSafety::designation).toList()));
        }
        return r;
    }

    private static String key(String designation) {
        if (designation == null) {
            return "";
        }
        String k = designation.strip().toUpperCase(Locale.ROOT).replace(" ", "");
        return k.startsWith("R-") ? "R" + k.substring(2) : k;
    }

    private static RefrigerantSafetyTable load() {
        try (InputStream in = RefrigerantSafetyTable.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("refrigerant safety table missing from the class path: " + RESOURCE);
            }
            return parse(new ObjectMapper().readTree(in));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the refrigerant safety table", e);
        }
    }

    static RefrigerantSafetyTable parse(JsonNode root) {
        Map<String, Citation> refs = new LinkedHashMap<>();
        root.path("references").fields().forEachRemaining(e ->
                refs.put(e.getKey(), Citation.of(e.getKey(), e.getValue().asText())));
        Map<String, RefrigerantSafety> byKey = new LinkedHashMap<>();
        for (JsonNode n : root.path("refrigerants")) {
            String designation = n.path("designation").asText();
            Citation source = refs.get(n.path("source").asText());
            if (source == null) {
                throw new IllegalStateException("refrigerant safety table: " + designation + " names an unknown source");
            }
            JsonNode lfl = n.path("lfl_kg_m3");
            RefrigerantSafety r = new RefrigerantSafety(designation,
                    SafetyClass.parse("safetyClass", n.path("safetyClass").asText()),
                    lfl.isNumber() ? OptionalDouble.of(lfl.asDouble()) : OptionalDouble.empty(),
                    n.path("practicalLimit_kg_m3").asDouble(), source, n.path("note").asText());
            if (byKey.put(key(designation), r) != null) {
                throw new IllegalStateException("refrigerant safety table: " + designation + " listed twice");
            }
        }
        return new RefrigerantSafetyTable(Collections.unmodifiableMap(byKey), List.copyOf(byKey.values()),
                Collections.unmodifiableMap(refs));
    }
}
