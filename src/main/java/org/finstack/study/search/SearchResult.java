package org.finstack.study.search;

import java.util.List;
import java.util.Objects;

/**
 * The outcome of a candidate search.
 *
 * @param model        rating model used (as in {@link org.finstack.coil.Rating#model()})
 * @param requirement  the capacity candidates were asked to reach
 * @param candidates   rated candidates in ranked order
 * @param generated    combinations enumerated within the constraints
 * @param failed       combinations refused (impossible geometry) or whose rating failed
 * @param failures     the failures grouped by the field and kind of refusal, most frequent first
 * @param notes        patterns left out and other remarks
 * @param threads      worker threads used
 * @param seconds      wall-clock time of the rating [s]
 */
public record SearchResult(String model, Requirement requirement, List<CandidateResult> candidates, int generated,
        int failed, List<FailureGroup> failures, List<String> notes, int threads, double seconds) {

    /** Copies the lists. */
    public SearchResult {
        Objects.requireNonNull(requirement, "requirement");
        candidates = List.copyOf(candidates);
        failures = List.copyOf(failures);
        notes = List.copyOf(notes);
    }

    /** @return candidates rated */
    public int rated() {
        return candidates.size();
    }

    /** @return rated candidates meeting the requirement */
    public int meeting() {
        return (int) candidates.stream().filter(CandidateResult::meetsRequirement).count();
    }

    /** @return rated candidates on the Pareto front */
    public int paretoOptimal() {
        return (int) candidates.stream().filter(CandidateResult::paretoOptimal).count();
    }

    /**
     * The capacity a candidate must reach.
     *
     * @param capacity [W], or 0 for none
     * @param basis    where it comes from, in words
     */
    public record Requirement(double capacity, String basis) {
    }

    /**
     * Failures of one kind.
     *
     * @param field   the field the refusal names (empty when none)
     * @param count   how many candidates failed so
     * @param example one of them: the candidate's name and the full reason
     */
    public record FailureGroup(String field, int count, String example) {
    }
}
