package org.finstack.study.search;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicInteger;
import org.assertj.core.api.Assertions;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Rating;
import org.finstack.geometry.CoilGeometry;
import org.finstack.study.Constraints;
import org.finstack.study.Progress;
import org.finstack.study.Project;
import org.junit.jupiter.api.Test;

/**
 * Whole searches on small spaces: each result agrees with a single rating of the same coil
 * ({@link CoilModels#rate}, the reference the search must reproduce), the requirement's basis,
 * failed candidates counted and skipped, louvered candidates only where the project states a
 * louver, threads not changing the answer, cancellation.
 */
class CandidateSearchTest {

    private static final Project ISO = SearchFixtures.project(SearchFixtures.ISOTHERMAL);

    @Test
    void resultsAgreeWithSingleRatingsIsothermal() {
        SearchResult r = CandidateSearch.run(ISO, SearchFixtures.small(ISO), 2, Progress.NONE);
        assertThat(r.rated()).isEqualTo(10);
        assertThat(r.model()).isEqualTo("isothermal");
        for (CandidateResult c : r.candidates()) {
            Rating single = CoilModels.rate(ISO.conditions().caseFor(c.candidate().coil()));
            assertThat(c.capacity()).as(c.candidate().name()).isEqualTo(single.capacity());
            assertThat(c.airPressureDrop()).isEqualTo(single.airPressureDrop());
            assertThat(c.metalMass()).isEqualTo(single.geometry().metalMass());
            assertThat(c.charge()).isNull();
        }
    }

    @Test
    void resultsAgreeWithSingleRatingsZoneModelWithCharge() {
        Project zones = SearchFixtures.project(SearchFixtures.ZONES);
        SearchSpace space = SearchFixtures.small(zones).withRows(3, 3);
        SearchResult r = CandidateSearch.run(zones, space, 2, Progress.NONE);
        assertThat(r.model()).isEqualTo("zones");
        assertThat(r.rated()).isPositive();
        for (CandidateResult c : r.candidates()) {
            Rating single = CoilModels.rate(zones.conditions().caseFor(c.candidate().coil()));
            assertThat(c.capacity()).as(c.candidate().name()).isEqualTo(single.capacity());
            assertThat(c.airPressureDrop()).isEqualTo(single.airPressureDrop());
            assertThat(c.charge()).isEqualTo(single.refrigerant().charge()).isPositive();
        }
    }

    @Test
    void ranksAreConsecutiveAndFollowTheDocumentedOrder() {
        SearchResult r = CandidateSearch.run(ISO, SearchFixtures.small(ISO), 2, Progress.NONE);
        List<Ranking.Entry> entries = r.candidates().stream().map(CandidateResult::entry).toList();
        for (int i = 0; i < entries.size(); i++) {
            assertThat(r.candidates().get(i).rank()).isEqualTo(i + 1);
            if (i > 0) {
                assertThat(Ranking.order(r.requirement().capacity()).compare(entries.get(i - 1), entries.get(i)))
                        .isNegative();
            }
            assertThat(r.candidates().get(i).meetsRequirement())
                    .isEqualTo(entries.get(i).capacity() >= r.requirement().capacity());
        }
        assertThat(r.requirement().capacity()).isEqualTo(7000); // the project's required capacity, 7 kW
    }

    /** Invariant: capacity rises with fin density and rows on one pattern, so the front is not empty and the densest coil is on it. */
    @Test
    void paretoMarkingMatchesTheFrontOfTheResults() {
        SearchResult r = CandidateSearch.run(ISO, SearchFixtures.small(ISO), 2, Progress.NONE);
        boolean[] front = Ranking.paretoFront(r.candidates().stream().map(CandidateResult::entry).toList());
        for (int i = 0; i < front.length; i++) {
            assertThat(r.candidates().get(i).paretoOptimal()).isEqualTo(front[i]);
        }
        CandidateResult largest = r.candidates().stream()
                .max(java.util.Comparator.comparingDouble(CandidateResult::capacity)).orElseThrow();
        assertThat(largest.paretoOptimal()).isTrue();
    }

    @Test
    void withoutRequiredCapacityTheExistingCoilIsTheBasis() {
        Project p = new Project(1, "no requirement", ISO.conditions(), ISO.existing(), ISO.options(),
                new Constraints(0.95, 0.42, 0.1, 4, 0, List.of()), "");
        SearchResult r = CandidateSearch.run(p, SearchFixtures.small(p), 2, Progress.NONE);
        double existing = CoilModels.rate(p.caseOf(0)).capacity();
        assertThat(r.requirement().capacity()).isEqualTo(existing);
        assertThat(r.requirement().basis()).contains("existing coil");
        assertThat(r.candidates()).extracting(CandidateResult::rank).containsExactly(1, 2, 3, 4, 5, 6, 7, 8, 9, 10);
        assertThat(r.meeting()).isBetween(1, 9);
    }

    @Test
    void withNeitherRequirementNorExistingCoilAllMeetAndLargestCapacityLeads() {
        Project p = new Project(1, "open", ISO.conditions(), null, ISO.options(),
                new Constraints(0.95, 0.42, 0.1, 4, 0, List.of()), "");
        SearchResult r = CandidateSearch.run(p, SearchFixtures.small(p), 2, Progress.NONE);
        assertThat(r.requirement().capacity()).isZero();
        assertThat(r.meeting()).isEqualTo(r.rated());
        for (int i = 1; i < r.rated(); i++) {
            assertThat(r.candidates().get(i - 1).capacity()).isGreaterThanOrEqualTo(r.candidates().get(i).capacity());
        }
    }

    /** 40 circuits need 40 tubes: the 1- and 2-row coils of 16 tubes per row are impossible and counted. */
    @Test
    void impossibleCandidatesAreCountedNotFatal() {
        SearchSpace space = SearchFixtures.small(ISO).withRows(1, 3).withCircuits(List.of(40));
        SearchResult r = CandidateSearch.run(ISO, space, 2, Progress.NONE);
        assertThat(r.generated()).isEqualTo(15);
        assertThat(r.failed()).isEqualTo(10);
        assertThat(r.rated()).isEqualTo(5);
        assertThat(r.failures()).singleElement().satisfies(f -> {
            assertThat(f.field()).isEqualTo("circuits");
            assertThat(f.count()).isEqualTo(10);
        });
        assertThat(r.candidates()).allMatch(c -> c.candidate().coil().rows() == 3);
    }

    /** The search example states a louver on the 3/8 in pattern: louvered candidates there only; one row is refused by the correlation. */
    @Test
    void louveredCandidatesOnlyWhereTheProjectStatesALouver() {
        Project zones = SearchFixtures.project(SearchFixtures.ZONES);
        SearchSpace space = SearchSpace.forProject(zones);
        assertThat(space.louvers()).singleElement().satisfies(l -> {
            assertThat(l.louverPitch()).isEqualTo(0.0024, Assertions.within(1e-12));
            assertThat(l.louverHeight()).isEqualTo(0.0010, Assertions.within(1e-12));
        });
        List<Candidate> all = CandidateGenerator.generate(space).candidates();
        assertThat(all).filteredOn(c -> c.coil().finType().equals(CoilGeometry.LOUVERED)).isNotEmpty()
                .allMatch(c -> c.patternId().equals("3/8in-25.4x22"));
        SearchSpace oneRow = space.withPatterns(List.of("3/8in-25.4x22")).withRows(1, 1);
        SearchResult r = CandidateSearch.run(zones.withConditions(ISO.conditions()), oneRow, 2, Progress.NONE);
        assertThat(r.failures()).anySatisfy(f -> assertThat(f.field()).isEqualTo("coil.rows"));
        assertThat(r.candidates()).allMatch(c -> c.candidate().coil().finType().equals("plain"));
    }

    @Test
    void threadsDoNotChangeTheAnswer() {
        SearchSpace space = SearchFixtures.small(ISO).withRows(1, 4);
        SearchResult one = CandidateSearch.run(ISO, space, 1, Progress.NONE);
        SearchResult two = CandidateSearch.run(ISO, space, 2, Progress.NONE);
        assertThat(two.candidates()).extracting(c -> c.candidate().name())
                .containsExactlyElementsOf(one.candidates().stream().map(c -> c.candidate().name()).toList());
        assertThat(two.candidates()).extracting(CandidateResult::capacity)
                .containsExactlyElementsOf(one.candidates().stream().map(CandidateResult::capacity).toList());
    }

    @Test
    void progressReachesTheTotalAndCancellationStops() {
        AtomicInteger last = new AtomicInteger();
        Progress counting = new Progress() {
            @Override
            public void step(int done, int total) {
                last.accumulateAndGet(done, Math::max);
            }

            @Override
            public boolean cancelled() {
                return false;
            }
        };
        CandidateSearch.run(ISO, SearchFixtures.small(ISO), 2, counting);
        assertThat(last.get()).isEqualTo(10);
        Progress stop = new Progress() {
            @Override
            public void step(int done, int total) {
                // nothing to show
            }

            @Override
            public boolean cancelled() {
                return true;
            }
        };
        Assertions.assertThatThrownBy(() -> CandidateSearch.run(ISO, SearchFixtures.small(ISO), 2, stop))
                .isInstanceOf(CancellationException.class);
    }

    @Test
    void pressureMarginAndFanReserveAreGiven() {
        SearchResult r = CandidateSearch.run(ISO, SearchFixtures.small(ISO), 2, Progress.NONE);
        CandidateResult c = r.candidates().get(0);
        // copper 9.52 x 0.30 mm against R-134a at 50 C: a margin well above 1 (the tube rating is ASME B31 based)
        assertThat(c.pressureMargin()).isNotNull();
        assertThat(c.pressureMargin().margin()).isGreaterThan(1);
        // the demo's fan curve spans 2400 to 3400 m3/h; 2.2 m/s on 0.95 x 0.4064 m is 3058 m3/h, on the curve
        assertThat(c.fanReserve()).isNotNull();
    }

    @Test
    void benchmarkMeasuresASmallSpace() {
        SearchBenchmark.Result b = SearchBenchmark.candidatesPerSecond(ISO, SearchFixtures.small(ISO), 2, 0);
        assertThat(b.candidatesPerSearch()).isEqualTo(10);
        assertThat(b.searches()).isEqualTo(1);
        assertThat(b.candidatesPerSecond()).isPositive();
        assertThat(SearchBenchmark.benchSpace(ISO).circuits()).containsExactly(1, 2, 4, 8);
    }
}
