package org.finstack.study.compare;

import org.finstack.coil.Rating;

/**
 * Where the project's fan runs with one coil in its path: the airflow it delivers through the
 * coil and the coil's rating at that airflow, or the reason there is none.
 *
 * @param rating         the coil rated at the delivered airflow, or null
 * @param staticPressure the fan's static pressure there, equal to the coil's air pressure drop [Pa]
 * @param ratings        coil ratings spent finding the point
 * @param error          why there is no operating point, or null
 */
public record FanResult(Rating rating, double staticPressure, int ratings, String error) {

    /** @return whether an operating point was found */
    public boolean found() {
        return rating != null;
    }

    /** @return the delivered airflow at the coil's inlet state [m3/s] (only when {@link #found()}) */
    public double airflow() {
        return rating.airVolumeFlow();
    }

    /** @return the capacity at the delivered airflow [W] (only when {@link #found()}) */
    public double capacity() {
        return rating.capacity();
    }
}
