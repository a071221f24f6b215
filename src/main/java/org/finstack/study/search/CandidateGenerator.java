package org.finstack.study.search;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.finstack.core.FinstackException;
import org.finstack.core.Numbers;
import org.finstack.geometry.CoilGeometry;
import org.finstack.material.Material;

/**
 * Enumerates the candidates of a {@link SearchSpace}: for each pattern that fits the opening at
 * least once, each fin type (plain; louvered where {@link SearchSpace.Louver} states it), fin
 * pitch, row count within the depth, tube material, fin material and circuit count, in that
 * nesting order. A combination whose geometry is impossible (more circuits than tubes, a
 * coating thicker than the fin gap allows, a louver pitch not below the row pitch, ...) is not
 * a candidate: it is returned as a failure with the reason.
 */
public final class CandidateGenerator {

    private static final double INCH = 0.0254; // definition of the inch [m] (NIST SP 811)

    private CandidateGenerator() {
    }

    /**
     * A combination refused before rating, or a candidate whose rating failed.
     *
     * @param name   the combination's name
     * @param field  the field the refusal names (empty when none)
     * @param reason the reason, in words
     */
    public record Failure(String name, String field, String reason) {
    }

    /**
     * What a space yields.
     *
     * @param candidates the buildable candidates, in enumeration order
     * @param failures   combinations whose geometry was refused
     * @param notes      patterns left out entirely, with the reason
     */
    public record Generated(List<Candidate> candidates, List<Failure> failures, List<String> notes) {

        /** Copies the lists. */
        public Generated {
            candidates = List.copyOf(candidates);
            failures = List.copyOf(failures);
            notes = List.copyOf(notes);
        }

        /** @return combinations enumerated: candidates plus failures */
        public int count() {
            return candidates.size() + failures.size();
        }
    }

    /**
     * @param space the space
     * @return its candidates and refused combinations
     */
    public static Generated generate(SearchSpace space) {
        List<Candidate> out = new ArrayList<>();
        List<Failure> failures = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        for (TubePattern p : space.patterns()) {
            int perRow = space.tubesPerRow(p);
            int maxRows = space.rowsUpTo(p);
            if (perRow < 1) {
                notes.add(p.id() + " left out: one tube pitch (" + mm(p.transversePitch())
                        + ") is taller than the face height allowed (" + mm(space.faceHeight()) + ")");
                continue;
            }
            if (maxRows < space.minRows()) {
                notes.add(p.id() + " left out: " + space.minRows() + " row(s) of " + mm(p.rowPitch())
                        + " are deeper than the depth allowed (" + mm(space.maxDepth()) + ")");
                continue;
            }
            List<FinVariant> fins = new ArrayList<>();
            fins.add(new FinVariant("plain", CoilGeometry.FinPattern.NONE, ""));
            for (SearchSpace.Louver l : space.louvers()) {
                if (l.fits(p)) {
                    fins.add(new FinVariant(CoilGeometry.LOUVERED,
                            CoilGeometry.FinPattern.louvered(l.louverPitch(), l.louverHeight()),
                            " (louvers of " + l.from() + ")"));
                }
            }
            for (FinVariant fin : fins) {
                for (double pitch : p.finPitches()) {
                    for (int rows = space.minRows(); rows <= maxRows; rows++) {
                        for (Material tube : space.tubeMaterials()) {
                            for (Material finMaterial : space.finMaterials()) {
                                for (int circuits : space.circuits()) {
                                    String name = String.format(Locale.ROOT, "%s %dR %sfpi %s %s/%s %dc", p.id(), rows,
                                            fpi(pitch), fin.type(), tube.id(), finMaterial.id(),
                                            circuits);
                                    try {
                                        CoilGeometry g = new CoilGeometry(p.tubeOuterDiameter(), p.tubeWall(), tube,
                                                p.arrangement(), p.transversePitch(), p.rowPitch(), rows, perRow,
                                                space.faceWidth(), fin.type(), pitch, p.finThickness(), finMaterial,
                                                circuits, space.coating(), space.coatingThickness(), fin.pattern());
                                        out.add(new Candidate(name, describe(p, g, fin), p.id(), g));
                                    } catch (FinstackException e) {
                                        failures.add(new Failure(name, field(e), e.getMessage()));
                                    }
                                }
                            }
                        }
                    }
                }
            }
        }
        return new Generated(out, failures, notes);
    }

    static String field(FinstackException e) {
        return e instanceof org.finstack.core.InputException ie ? ie.field() : "";
    }

    private static String describe(TubePattern p, CoilGeometry g, FinVariant fin) {
        return String.format(Locale.ROOT, "%d rows x %d tubes of %s %s on %s, %s x %s face, %s fins%s at %s fpi "
                + "(%s), %d circuit(s)%s", g.rows(), g.tubesPerRow(), mm(g.tubeOuterDiameter()),
                g.tubeMaterial().id(), p.id(), mm(g.finnedLength()), mm(g.tubesPerRow() * g.transversePitch()),
                fin.type(), fin.note(), fpi(g.finPitch()), g.finMaterial().id(), g.circuits(),
                g.coating() == null ? "" : ", " + g.coating().id() + " coated");
    }

    /** Fin density in fins per inch, to two decimals (the trade's unit for it). */
    private static String fpi(double pitch) {
        return Numbers.brief(Math.round(INCH / pitch * 100) / 100.0);
    }

    private static String mm(double m) {
        return Numbers.brief(m * 1000) + " mm";
    }

    private record FinVariant(String type, CoilGeometry.FinPattern pattern, String note) {
    }
}
