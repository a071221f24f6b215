package org.finstack.study.compare;

import java.util.List;
import java.util.Objects;
import org.finstack.coil.AirInlet;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Rating;
import org.finstack.core.ConvergenceException;
import org.finstack.core.FinstackException;
import org.finstack.study.Constraints;
import org.finstack.study.fan.FanCurve;
import org.finstack.study.fan.OperatingPoint;

/**
 * The airflow a fan delivers through a coil: where the fan curve meets the coil's air-side
 * pressure-drop curve. The coil's curve is known only by rating the coil at trial airflows, so
 * the point is found by a bounded secant-like iteration: the coil's drop is fitted through the
 * two latest ratings as dp = k Q^n (n held between 1 and 2.5; one rating starts with n = 1.8,
 * the middle of the 1.5 to 2 range of finned coils, common practice), the fitted curve is
 * intersected with the fan curve ({@link FanCurve#operatingPoint}), and the coil is rated at the
 * new airflow, until the airflow moves by less than {@link #TOLERANCE} of itself, within at most
 * {@link #MAX_RATINGS} ratings. Only the coil's drop is counted: ducting, filters and grilles in
 * the same air path would lower the airflow further.
 */
public final class FanMatch {

    /** Largest number of coil ratings spent on one operating point. */
    public static final int MAX_RATINGS = 12;

    /** Relative change of airflow at which the point counts as found [-]. */
    public static final double TOLERANCE = 1e-4;

    /** Starting pressure-drop exponent, the middle of the 1.5 to 2 range of finned coils (common practice). */
    static final double START_EXPONENT = 1.8;

    private FanMatch() {
    }

    /**
     * @param points the project's fan curve (at least two points)
     * @return the fan curve
     */
    public static FanCurve curve(List<Constraints.FanPoint> points) {
        double[] q = new double[points.size()];
        double[] p = new double[points.size()];
        for (int i = 0; i < q.length; i++) {
            q[i] = points.get(i).volumeFlow();
            p[i] = points.get(i).pressure();
        }
        return new FanCurve(q, p);
    }

    /**
     * Finds the fan's operating point with a coil in its path.
     *
     * @param base   the coil's case at its stated airflow
     * @param stated the case's rating at the stated airflow (the first trial point)
     * @param fan    the fan curve
     * @return the operating point with the coil's rating there, or the reason there is none
     */
    public static FanResult match(CoilCase base, Rating stated, FanCurve fan) {
        Objects.requireNonNull(base, "base");
        Objects.requireNonNull(stated, "stated");
        Objects.requireNonNull(fan, "fan");
        Rating previous = null;
        Rating current = stated;
        int ratings = 0;
        double lastStep = Double.MAX_VALUE;
        try {
            while (true) {
                double q1 = current.airVolumeFlow();
                double dp1 = current.airPressureDrop();
                double n = START_EXPONENT;
                if (previous != null && Math.abs(previous.airVolumeFlow() - q1) > 1e-9 * q1
                        && previous.airPressureDrop() > 0 && dp1 > 0) {
                    n = Math.log(dp1 / previous.airPressureDrop()) / Math.log(q1 / previous.airVolumeFlow());
                    n = Math.max(1, Math.min(2.5, n));
                }
                double k = dp1 / Math.pow(q1, n);
                double exponent = n;
                OperatingPoint op = fan.operatingPoint(q -> k * Math.pow(q, exponent));
                lastStep = Math.abs(op.flow() - q1);
                if (lastStep <= TOLERANCE * op.flow()) {
                    return new FanResult(current, fan.pressure(q1), ratings, null);
                }
                if (ratings >= MAX_RATINGS) {
                    throw new ConvergenceException("fan airflow through the coil", MAX_RATINGS, lastStep / op.flow());
                }
                previous = current;
                current = CoilModels.rate(atAirflow(base, op.flow()));
                ratings++;
            }
        } catch (FinstackException e) {
            return new FanResult(null, 0, ratings, e.getMessage());
        }
    }

    /**
     * @param base a case
     * @param flow volume flow at the inlet state [m3/s]
     * @return the case with that airflow (the air's other properties kept)
     */
    public static CoilCase atAirflow(CoilCase base, double flow) {
        AirInlet a = base.air();
        return base.withAir(new AirInlet(a.temperature(), 0, flow, a.pressure(), a.relativeHumidity()));
    }
}
