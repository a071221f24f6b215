package org.finstack.study.search;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.geometry.CoilGeometry;
import org.finstack.material.Coating;
import org.finstack.material.Material;
import org.finstack.material.Materials;
import org.finstack.study.Constraints;
import org.finstack.study.Option;
import org.finstack.study.Project;

/**
 * What a candidate search varies, and the opening it must fit. Every candidate is one choice of
 * pattern, fin type, fin pitch, rows, tube material, fin material and circuits; its face is the
 * largest the opening takes on that pattern: the finned length equals {@link #faceWidth} and the
 * tubes per row are the most whose height (tubes x transverse pitch) stays within
 * {@link #faceHeight}.
 *
 * <p><b>Fin types.</b> Plain fins on every pattern. Louvered fins only where a louver geometry
 * is stated: the trade has no generic louver (louver pitch and height are set by each maker's
 * die), so a louvered candidate takes the louver pitch and height of a louvered coil in the
 * project (existing coil or option) and only on a pattern with that coil's tube diameter and
 * pitches ({@link Louver}). Wavy fins are not searched (no wavy-fin correlation is
 * implemented).
 *
 * <p><b>Tube wall.</b> Each pattern's one wall is used with every tube material; the candidate's
 * design-pressure margin shows what that wall gives in each material.
 *
 * @param patterns         tube patterns to try
 * @param louvers          louver geometries stated in the project (may be empty)
 * @param minRows          fewest rows [-]
 * @param maxRows          most rows [-]; fewer where {@link #maxDepth} stops them
 * @param tubeMaterials    tube materials to try
 * @param finMaterials     fin materials to try
 * @param circuits         circuit counts to try
 * @param faceWidth        finned length of every candidate, the opening's width [m]
 * @param faceHeight       largest face height, the opening's height [m]
 * @param maxDepth         largest depth in the air direction (rows x row pitch) [m], or 0 for none
 * @param coating          coating of every candidate, or {@code null} for none
 * @param coatingThickness its film thickness [m] (0 without a coating)
 */
public record SearchSpace(List<TubePattern> patterns, List<Louver> louvers, int minRows, int maxRows,
        List<Material> tubeMaterials, List<Material> finMaterials, List<Integer> circuits, double faceWidth,
        double faceHeight, double maxDepth, Coating coating, double coatingThickness) {

    /** Most rows searched by default (common practice: coils deeper than 8 rows are rare in refrigeration). */
    public static final int DEFAULT_MAX_ROWS = 8;

    /** Default tube materials: copper and aluminium 3003, the usual coil tubes (common practice). */
    public static final List<String> DEFAULT_TUBE_MATERIALS = List.of("copper", "aluminium-3003");

    /** Default fin materials: aluminium fin stock and copper fins (common practice). */
    public static final List<String> DEFAULT_FIN_MATERIALS = List.of("aluminium", "copper-etp");

    /** Relative slack on the opening's limits, so a face of exactly the limit fits despite rounding [-]. */
    static final double SLACK = 1e-9;

    /** Validates and copies. */
    public SearchSpace {
        patterns = List.copyOf(patterns);
        louvers = louvers == null ? List.of() : List.copyOf(louvers);
        tubeMaterials = List.copyOf(tubeMaterials);
        finMaterials = List.copyOf(finMaterials);
        circuits = List.copyOf(circuits);
        if (patterns.isEmpty()) {
            throw new InputException("search.patterns", Msg.MISSING);
        }
        if (tubeMaterials.isEmpty()) {
            throw new InputException("search.tubeMaterials", Msg.MISSING);
        }
        if (finMaterials.isEmpty()) {
            throw new InputException("search.finMaterials", Msg.MISSING);
        }
        if (circuits.isEmpty()) {
            throw new InputException("search.circuits", Msg.MISSING);
        }
        for (int n : circuits) {
            Check.atLeastOne("search.circuits", n);
        }
        Check.atLeastOne("search.minRows", minRows);
        if (maxRows < minRows) {
            throw new InputException("search.maxRows", Msg.NOT_BELOW, (double) minRows, (double) maxRows + 1);
        }
        Check.within("search.maxRows", maxRows, 1, 100);
        Check.positive("search.faceWidth", faceWidth);
        Check.positive("search.faceHeight", faceHeight);
        Check.nonNegative("search.maxDepth", maxDepth);
        if (coating == null && coatingThickness != 0) {
            throw new InputException("search.coatingThickness", Msg.EITHER_REQUIRED, "a coating", "no thickness");
        }
    }

    /**
     * A louver geometry stated in a project, with the tube pattern it belongs to.
     *
     * @param from              name of the project's coil it was taken from
     * @param tubeOuterDiameter that coil's tube outside diameter [m]
     * @param transversePitch   its transverse pitch [m]
     * @param rowPitch          its row pitch [m]
     * @param louverPitch       Lp [m]
     * @param louverHeight      Lh [m]
     */
    public record Louver(String from, double tubeOuterDiameter, double transversePitch, double rowPitch,
            double louverPitch, double louverHeight) {

        /** Match tolerance on tube diameter and pitches [m] (0.1 mm: a measured coil's reading). */
        public static final double MATCH = 1e-4;

        /**
         * @param p a pattern
         * @return whether this louver belongs to that pattern (same tube and pitches within {@link #MATCH})
         */
        public boolean fits(TubePattern p) {
            return Math.abs(p.tubeOuterDiameter() - tubeOuterDiameter) <= MATCH
                    && Math.abs(p.transversePitch() - transversePitch) <= MATCH
                    && Math.abs(p.rowPitch() - rowPitch) <= MATCH;
        }
    }

    /**
     * The default space for a project: the shipped patterns, 1 to {@link #DEFAULT_MAX_ROWS} rows,
     * {@link #DEFAULT_TUBE_MATERIALS} and {@link #DEFAULT_FIN_MATERIALS}, the louvers its
     * louvered coils state, and the opening from its constraints. A limit the constraints leave
     * unset is taken from the existing coil (a replacement goes into its place), else from the
     * first option: face width and height, and the circuits (the distributor feeds as many as
     * the coil in place has). Depth has no limit unless the constraints set one. The existing
     * coil's coating, if any, is given to every candidate.
     *
     * @param project the project
     * @return the space
     */
    public static SearchSpace forProject(Project project) {
        Objects.requireNonNull(project, "project");
        Constraints k = project.constraints();
        Option basis = project.existing() != null ? project.existing() : project.allOptions().get(0);
        CoilGeometry b = basis.coil();
        double width = k.maxFaceWidth() > 0 ? k.maxFaceWidth() : b.finnedLength();
        double height = k.maxFaceHeight() > 0 ? k.maxFaceHeight() : b.tubesPerRow() * b.transversePitch();
        int circuits = k.circuits() > 0 ? k.circuits() : b.circuits();
        Materials lib = Materials.library();
        List<Material> tubes = DEFAULT_TUBE_MATERIALS.stream().map(m -> lib.tube("search.tubeMaterials", m)).toList();
        List<Material> fins = DEFAULT_FIN_MATERIALS.stream().map(m -> lib.fin("search.finMaterials", m)).toList();
        CoilGeometry existing = project.existing() == null ? null : project.existing().coil();
        return new SearchSpace(TubePattern.library(), louvers(project), 1, DEFAULT_MAX_ROWS, tubes, fins,
                List.of(circuits), width, height, k.maxDepth(), existing == null ? null : existing.coating(),
                existing == null ? 0 : existing.coatingThickness());
    }

    /**
     * @param project a project
     * @return the louver geometries its louvered coils state, each once
     */
    public static List<Louver> louvers(Project project) {
        Set<Louver> out = new LinkedHashSet<>();
        Set<List<Double>> seen = new LinkedHashSet<>();
        for (Option o : project.allOptions()) {
            CoilGeometry g = o.coil();
            if (CoilGeometry.LOUVERED.equalsIgnoreCase(g.finType().strip())) {
                CoilGeometry.FinPattern p = g.finPattern();
                List<Double> key = List.of(g.tubeOuterDiameter(), g.transversePitch(), g.rowPitch(), p.louverPitch(),
                        p.louverHeight());
                if (seen.add(key)) {
                    out.add(new Louver(o.name(), g.tubeOuterDiameter(), g.transversePitch(), g.rowPitch(),
                            p.louverPitch(), p.louverHeight()));
                }
            }
        }
        return new ArrayList<>(out);
    }

    /**
     * @param ids pattern ids to keep
     * @return this space with only those patterns (in this space's order)
     * @throws InputException ({@code search.patterns}) if an id is unknown
     */
    public SearchSpace withPatterns(List<String> ids) {
        List<TubePattern> kept = new ArrayList<>();
        for (String id : ids) {
            kept.add(patterns.stream().filter(p -> p.id().equals(id)).findFirst()
                    .orElseThrow(() -> new InputException("search.patterns", Msg.UNKNOWN_NAME, id,
                            String.join(", ", patterns.stream().map(TubePattern::id).toList()))));
        }
        return new SearchSpace(kept, louvers, minRows, maxRows, tubeMaterials, finMaterials, circuits, faceWidth,
                faceHeight, maxDepth, coating, coatingThickness);
    }

    /**
     * @param min fewest rows
     * @param max most rows
     * @return this space with another row range
     */
    public SearchSpace withRows(int min, int max) {
        return new SearchSpace(patterns, louvers, min, max, tubeMaterials, finMaterials, circuits, faceWidth,
                faceHeight, maxDepth, coating, coatingThickness);
    }

    /**
     * @param tubes tube materials
     * @param fins  fin materials
     * @return this space with other materials
     */
    public SearchSpace withMaterials(List<Material> tubes, List<Material> fins) {
        return new SearchSpace(patterns, louvers, minRows, maxRows, tubes, fins, circuits, faceWidth, faceHeight,
                maxDepth, coating, coatingThickness);
    }

    /**
     * @param counts circuit counts to try
     * @return this space with other circuit counts
     */
    public SearchSpace withCircuits(List<Integer> counts) {
        return new SearchSpace(patterns, louvers, minRows, maxRows, tubeMaterials, finMaterials, counts, faceWidth,
                faceHeight, maxDepth, coating, coatingThickness);
    }

    /**
     * @param width  finned length [m]
     * @param height largest face height [m]
     * @param depth  largest depth [m], or 0 for none
     * @return this space with another opening
     */
    public SearchSpace withOpening(double width, double height, double depth) {
        return new SearchSpace(patterns, louvers, minRows, maxRows, tubeMaterials, finMaterials, circuits, width,
                height, depth, coating, coatingThickness);
    }

    /**
     * @param p a pattern
     * @return the tubes per row of that pattern in this opening (0 when not even one fits)
     */
    public int tubesPerRow(TubePattern p) {
        return (int) Math.floor(faceHeight / p.transversePitch() * (1 + SLACK));
    }

    /**
     * @param p a pattern
     * @return the most rows of that pattern within {@link #maxDepth} and {@link #maxRows}
     */
    public int rowsUpTo(TubePattern p) {
        if (maxDepth == 0) {
            return maxRows;
        }
        return Math.min(maxRows, (int) Math.floor(maxDepth / p.rowPitch() * (1 + SLACK)));
    }
}
