package org.finstack.study.search;

import java.util.Objects;
import org.finstack.coil.Rating;
import org.finstack.study.pressure.DesignPressureMargin;

/**
 * One rated candidate in its place in the ranking.
 *
 * @param rank             position in the documented order ({@link Ranking}), from 1
 * @param candidate        the candidate
 * @param rating           its rating at the project's conditions
 * @param meetsRequirement whether its capacity reaches the search's requirement (always true without one)
 * @param paretoOptimal    whether it lies on the front of capacity against air pressure drop
 * @param charge           refrigerant charge [kg], or {@code null} when the model gives none
 * @param metalMass        metal mass of tubes and fins [kg]
 * @param pressureMargin   design-pressure margin of its tube, or {@code null} when it cannot be estimated
 * @param fanReserve       fan static pressure at the candidate's airflow less its air pressure drop [Pa],
 *                         or {@code null} without a fan curve or when the airflow is off the curve
 */
public record CandidateResult(int rank, Candidate candidate, Rating rating, boolean meetsRequirement,
        boolean paretoOptimal, Double charge, double metalMass, DesignPressureMargin pressureMargin,
        Double fanReserve) {

    /** Checks the parts are present. */
    public CandidateResult {
        Objects.requireNonNull(candidate, "candidate");
        Objects.requireNonNull(rating, "rating");
    }

    /** @return capacity [W] */
    public double capacity() {
        return rating.capacity();
    }

    /** @return air-side pressure drop [Pa] */
    public double airPressureDrop() {
        return rating.airPressureDrop();
    }

    /** @return what the ranking looks at */
    public Ranking.Entry entry() {
        return new Ranking.Entry(candidate.name(), capacity(), airPressureDrop(), charge, metalMass);
    }
}
