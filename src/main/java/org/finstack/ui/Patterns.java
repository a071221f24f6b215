package org.finstack.ui;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.finstack.geometry.Arrangement;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;

/** The generic tube patterns of {@code coil-library/patterns.json}, offered to fill the coil form. */
public final class Patterns {

    /** Class-path location of the data file. */
    public static final String RESOURCE = "/coil-library/patterns.json";

    /**
     * One pattern.
     *
     * @param id                its id, e.g. {@code 3/8in-25.4x22}
     * @param description       what it is used for
     * @param tubeOuterDiameter [m]
     * @param tubeWall          [m]
     * @param arrangement       staggered or inline
     * @param transversePitch   [m]
     * @param rowPitch          [m]
     * @param finThickness      [m]
     */
    public record Pattern(String id, String description, double tubeOuterDiameter, double tubeWall,
            Arrangement arrangement, double transversePitch, double rowPitch, double finThickness) {

        @Override
        public String toString() {
            return id;
        }
    }

    private Patterns() {
    }

    /** @return the patterns, in file order */
    public static List<Pattern> load() {
        try (InputStream in = Patterns.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("pattern library missing from the class path: " + RESOURCE);
            }
            JsonNode root = new ObjectMapper().readTree(in);
            List<Pattern> out = new ArrayList<>();
            for (JsonNode n : root.path("patterns")) {
                String id = n.path("id").asText();
                out.add(new Pattern(id, n.path("description").asText(), len(n, id, "tubeOuterDiameter"),
                        len(n, id, "tubeWall"), Arrangement.parse(id + ".arrangement", n.path("arrangement").asText()),
                        len(n, id, "transversePitch"), len(n, id, "rowPitch"), len(n, id, "finThickness")));
            }
            return List.copyOf(out);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the pattern library", e);
        }
    }

    private static double len(JsonNode n, String id, String key) {
        return Quantities.parse(id + "." + key, n.path(key).asText(), Dimension.LENGTH);
    }
}
