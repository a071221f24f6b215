package org.finstack.study.search;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.finstack.geometry.CoilGeometry;
import org.finstack.geometry.DerivedGeometry;
import org.finstack.study.Constraints;
import org.finstack.study.Progress;
import org.finstack.study.Project;

/**
 * Invariant: no candidate a search generates or returns violates the constraints it was given
 * (face width, face height, depth, circuits), over random constraint sets; and every candidate
 * that fits is generated (the face is the largest the opening takes).
 */
class CandidateGeneratorProperties {

    private static final Project BASE = SearchFixtures.project(SearchFixtures.ISOTHERMAL);

    /** Relative slack the generator allows on a limit met exactly [-] (SearchSpace.SLACK). */
    private static final double SLACK = 1e-9;

    private static Project with(Constraints k) {
        return new Project(1, "random", BASE.conditions(), BASE.existing(), BASE.options(), k, "");
    }

    @Property(tries = 100)
    void generatedCandidatesRespectRandomConstraints(@ForAll @DoubleRange(min = 0.05, max = 2.5) double width,
            @ForAll @DoubleRange(min = 0.01, max = 1.5) double height,
            @ForAll @DoubleRange(min = 0, max = 0.3) double depth,
            @ForAll @IntRange(min = 0, max = 40) int circuits) {
        Constraints k = new Constraints(width, height, depth, circuits, 0, List.of());
        SearchSpace space = SearchSpace.forProject(with(k));
        CandidateGenerator.Generated gen = CandidateGenerator.generate(space);
        for (Candidate c : gen.candidates()) {
            assertFits(c.coil(), k);
        }
        for (TubePattern p : space.patterns()) {
            int perRow = space.tubesPerRow(p);
            // the largest face: one more tube would not fit
            assertThat((perRow + 1) * p.transversePitch()).isGreaterThan(height);
            if (depth > 0) {
                assertThat((space.rowsUpTo(p) + 1) * p.rowPitch() > depth || space.rowsUpTo(p) == space.maxRows())
                        .isTrue();
            }
        }
    }

    /** The same invariant on the rated results of whole (small) searches. */
    @Property(tries = 8)
    void searchResultsRespectRandomConstraints(@ForAll @DoubleRange(min = 0.3, max = 1.5) double width,
            @ForAll @DoubleRange(min = 0.1, max = 0.8) double height,
            @ForAll @DoubleRange(min = 0.03, max = 0.12) double depth,
            @ForAll @IntRange(min = 1, max = 12) int circuits) {
        Constraints k = new Constraints(width, height, depth, circuits, 0, List.of());
        Project p = with(k);
        SearchSpace space = SearchFixtures.small(p).withRows(1, 8);
        SearchResult r = CandidateSearch.run(p, space, 2, Progress.NONE);
        assertThat(r.rated() + r.failed()).isEqualTo(r.generated());
        for (CandidateResult c : r.candidates()) {
            assertFits(c.candidate().coil(), k);
        }
    }

    private static void assertFits(CoilGeometry g, Constraints k) {
        DerivedGeometry d = g.derive();
        String name = g.rows() + "x" + g.tubesPerRow() + " " + g.transversePitch();
        if (k.maxFaceWidth() > 0) {
            assertThat(d.faceWidth()).as(name).isLessThanOrEqualTo(k.maxFaceWidth() * (1 + SLACK));
        }
        if (k.maxFaceHeight() > 0) {
            assertThat(d.faceHeight()).as(name).isLessThanOrEqualTo(k.maxFaceHeight() * (1 + SLACK));
        }
        if (k.maxDepth() > 0) {
            assertThat(d.depth()).as(name).isLessThanOrEqualTo(k.maxDepth() * (1 + SLACK));
        }
        if (k.circuits() > 0) {
            assertThat(g.circuits()).as(name).isEqualTo(k.circuits());
        }
    }
}
