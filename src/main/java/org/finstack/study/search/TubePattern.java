package org.finstack.study.search;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.geometry.Arrangement;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;

/**
 * One generic tube-and-fin pattern of the trade: a round tube size with the pitches, wall, fin
 * thickness and fin densities commonly paired with it. The shipped patterns are in
 * {@code coil-library/patterns.json}; their dimensions are the trade's widely shared ones
 * (common practice), not any maker's data.
 *
 * @param id                pattern id, e.g. {@code 3/8in-25.4x22}
 * @param description       what it is used for
 * @param tubeOuterDiameter tube outside diameter [m]
 * @param tubeWall          tube wall thickness [m]
 * @param arrangement       staggered or inline rows
 * @param transversePitch   tube spacing across the air flow [m]
 * @param rowPitch          row spacing along the air flow [m]
 * @param finThickness      fin thickness [m]
 * @param finPitches        fin pitches offered with the pattern [m], in file order
 */
public record TubePattern(String id, String description, double tubeOuterDiameter, double tubeWall,
        Arrangement arrangement, double transversePitch, double rowPitch, double finThickness,
        List<Double> finPitches) {

    /** Class-path location of the shipped pattern file. */
    public static final String RESOURCE = "/coil-library/patterns.json";

    /** Source of the shipped patterns. */
    public static final Citation SOURCE = Citation.of("common practice",
            "Generic round-tube plate-fin patterns of the refrigeration trade (tube sizes, pitches, walls, fin "
                    + "thicknesses and fin densities widely shared between makers), coil-library/patterns.json; "
                    + "common practice, not any maker's data");

    /** Validates the dimensions and copies the fin pitches. */
    public TubePattern {
        Objects.requireNonNull(id, "id");
        description = description == null ? "" : description;
        Check.positive(id + ".tubeOuterDiameter", tubeOuterDiameter);
        Check.positive(id + ".tubeWall", tubeWall);
        Objects.requireNonNull(arrangement, "arrangement");
        Check.positive(id + ".transversePitch", transversePitch);
        Check.positive(id + ".rowPitch", rowPitch);
        Check.positive(id + ".finThickness", finThickness);
        finPitches = List.copyOf(finPitches);
        if (finPitches.isEmpty()) {
            throw new InputException(id + ".finDensities", Msg.MISSING);
        }
        for (int i = 0; i < finPitches.size(); i++) {
            Check.positive(id + ".finDensities[" + i + "]", finPitches.get(i));
        }
    }

    /** @return the patterns shipped in {@code coil-library/patterns.json}, in file order */
    public static List<TubePattern> library() {
        try (InputStream in = TubePattern.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("pattern library missing from the class path: " + RESOURCE);
            }
            return parse(new ObjectMapper().readTree(in));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the pattern library", e);
        }
    }

    /**
     * Reads patterns from the tree of a pattern file ({@code { "patterns": [ ... ] }}, lengths and
     * fin densities as "number unit" strings).
     *
     * @param root the file's JSON tree
     * @return the patterns, in file order
     * @throws InputException naming the pattern and key of a missing or bad value
     */
    public static List<TubePattern> parse(JsonNode root) {
        List<TubePattern> out = new ArrayList<>();
        for (JsonNode n : root.path("patterns")) {
            String id = n.path("id").asText();
            if (id.isBlank()) {
                throw new InputException("patterns.id", Msg.MISSING);
            }
            List<Double> pitches = new ArrayList<>();
            JsonNode list = n.path("finDensities");
            for (int i = 0; i < list.size(); i++) {
                pitches.add(Quantities.parse(id + ".finDensities[" + i + "]", list.get(i).asText(),
                        Dimension.FIN_PITCH));
            }
            out.add(new TubePattern(id, n.path("description").asText(), length(n, id, "tubeOuterDiameter"),
                    length(n, id, "tubeWall"), Arrangement.parse(id + ".arrangement", n.path("arrangement").asText()),
                    length(n, id, "transversePitch"), length(n, id, "rowPitch"), length(n, id, "finThickness"),
                    pitches));
        }
        return List.copyOf(out);
    }

    private static double length(JsonNode n, String id, String key) {
        if (!n.hasNonNull(key)) {
            throw new InputException(id + "." + key, Msg.MISSING);
        }
        return Quantities.parse(id + "." + key, n.path(key).asText(), Dimension.LENGTH);
    }
}
