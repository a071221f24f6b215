package org.finstack.material;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The material library, read once from {@code coil-library/materials.json} (shipped inside the
 * jar). Every value in that file names its source key; the sources' full entries are in the same
 * file.
 */
public final class Materials {

    /** Class-path location of the data file. */
    public static final String RESOURCE = "/coil-library/materials.json";

    private static final Materials LIBRARY = load();

    private final Map<String, Material> materials;
    private final Map<String, Coating> coatings;
    private final Map<String, Citation> references;

    private Materials(Map<String, Material> materials, Map<String, Coating> coatings,
            Map<String, Citation> references) {
        this.materials = materials;
        this.coatings = coatings;
        this.references = references;
    }

    /** @return the library shipped with Finstack */
    public static Materials library() {
        return LIBRARY;
    }

    /** @return every material, in file order */
    public List<Material> materials() {
        return materials.values().stream().distinct().toList();
    }

    /** @return every coating, in file order */
    public List<Coating> coatings() {
        return coatings.values().stream().distinct().toList();
    }

    /** @return the references named by the data, by key */
    public Map<String, Citation> references() {
        return references;
    }

    /**
     * Finds a tube material.
     *
     * @param field the input field, for messages
     * @param name  a material name as a user writes it (any case)
     * @return the material
     */
    public Material tube(String field, String name) {
        return pick(field, name, true);
    }

    /**
     * Finds a fin material.
     *
     * @param field the input field, for messages
     * @param name  a material name as a user writes it (any case)
     * @return the material
     */
    public Material fin(String field, String name) {
        return pick(field, name, false);
    }

    private Material pick(String field, String name, boolean tube) {
        Material m = materials.get(key(name));
        if (m == null || (tube ? !m.forTubes() : !m.forFins())) {
            String accepted = materials().stream().filter(x -> tube ? x.forTubes() : x.forFins())
                    .map(Material::id).collect(Collectors.joining(", "));
            throw new InputException(field, Msg.UNKNOWN_NAME, name, accepted);
        }
        return m;
    }

    /**
     * Finds a coating.
     *
     * @param field the input field, for messages
     * @param name  a coating name (any case)
     * @return the coating
     */
    public Coating coating(String field, String name) {
        Coating c = coatings.get(key(name));
        if (c == null) {
            throw new InputException(field, Msg.UNKNOWN_NAME, name,
                    coatings().stream().map(Coating::id).collect(Collectors.joining(", ")));
        }
        return c;
    }

    private static String key(String name) {
        return name == null ? "" : name.strip().toLowerCase(Locale.ROOT).replace('_', '-').replace(' ', '-');
    }

    private static Materials load() {
        try (InputStream in = Materials.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("material library missing from the class path: " + RESOURCE);
            }
            return parse(new ObjectMapper().readTree(in));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the material library", e);
        }
    }

    static Materials parse(JsonNode root) {
        Map<String, Citation> refs = new LinkedHashMap<>();
        root.path("references").fields().forEachRemaining(e ->
                refs.put(e.getKey(), Citation.of(e.getKey(), e.getValue().asText())));
        Map<String, Material> mats = new LinkedHashMap<>();
        for (JsonNode n : root.path("materials")) {
            Set<String> uses = new HashSet<>();
            n.path("use").forEach(u -> uses.add(u.asText()));
            Material m = new Material(n.path("id").asText(), names(n), uses, n.path("description").asText(),
                    n.path("conductivity_W_mK").asDouble(), n.path("density_kg_m3").asDouble(),
                    source(refs, n), n.path("note").asText());
            register(mats, m.names(), m, m.id());
        }
        Map<String, Coating> coats = new LinkedHashMap<>();
        for (JsonNode n : root.path("coatings")) {
            Coating c = new Coating(n.path("id").asText(), names(n), n.path("description").asText(),
                    n.path("conductivity_W_mK").asDouble(), n.path("typicalThickness_m").asDouble(),
                    source(refs, n), n.path("note").asText());
            register(coats, c.names(), c, c.id());
        }
        return new Materials(Collections.unmodifiableMap(mats), Collections.unmodifiableMap(coats),
                Collections.unmodifiableMap(refs));
    }

    private static List<String> names(JsonNode n) {
        List<String> names = new ArrayList<>();
        names.add(n.path("id").asText());
        n.path("names").forEach(x -> names.add(key(x.asText())));
        return names.stream().distinct().toList();
    }

    private static Citation source(Map<String, Citation> refs, JsonNode n) {
        String key = n.path("source").asText();
        Citation c = refs.get(key);
        if (c == null) {
            throw new IllegalStateException("material library: " + n.path("id").asText()
                    + " names an unknown source '" + key + "'");
        }
        return c;
    }

    private static <T> void register(Map<String, T> map, List<String> names, T value, String id) {
        for (String name : names) {
            if (map.put(name, value) != null) {
                throw new IllegalStateException("material library: name '" + name + "' used twice (" + id + ")");
            }
        }
    }
}
