package org.finstack.study.fouling;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.finstack.coil.AirInlet;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Rating;
import org.finstack.core.ConvergenceException;
import org.finstack.core.Warnings;

/**
 * Rates a coil at the airflow its fan actually delivers: the intersection of the fan curve with
 * the coil's air-side pressure-drop curve, the coil being rated (by {@link CoilModels#rate}) at
 * trial airflows.
 *
 * <p><b>Solution.</b> The case's own airflow is the starting guess Q0. At each trial flow Q_k
 * the coil is rated, giving dp_k; between ratings the coil's curve is taken as the power law
 * dp(Q) = dp_k (Q / Q_k)^n through the last rated point, whose exponent n is the log-log slope of
 * the last two rated points (first 1.8, the turbulent-to-transitional value of fin-coil pressure
 * drop, common practice; kept within 1 to 2.5). The fan's operating point on that curve is the
 * next trial flow. As the trial flows converge the power law passes through a rated point at the
 * operating flow, so the point found lies on the fan curve exactly and on the rated coil curve
 * within {@link #FLOW_TOLERANCE} of the flow (the rating returned is the one at the last trial flow). At most {@link #MAX_ITERATIONS} ratings; otherwise a
 * {@link ConvergenceException}.
 *
 * <p>Without a fan the coil is rated at the case's airflow, held constant: the capacity loss of a
 * fouled coil is then understated, since a real fan delivers less air through a dirtier coil.
 */
public final class FanInLoop {

    /** Most coil ratings spent on one operating point. */
    public static final int MAX_ITERATIONS = 40;

    /** Convergence tolerance on the airflow, relative [-]. */
    public static final double FLOW_TOLERANCE = 1e-6;

    /** First exponent of the coil's dp against flow [-]; common practice for fin coils. */
    static final double FIRST_EXPONENT = 1.8;

    /** Note added to a study without a fan. */
    public static final String HELD_CONSTANT = "no fan given: airflow held constant at the case's value,"
            + " so the loss of a fouled coil is understated (a real fan delivers less air through a dirtier coil)";

    private FanInLoop() {
    }

    /**
     * @param c       the case (its airflow is the starting guess)
     * @param fan     the fan, or {@code null} to hold the case's airflow
     * @param start   starting guess for the flow [m3/s], or 0 for the case's own
     * @return the rating at the operating airflow with the fan's point
     */
    public static LoopRating rate(CoilCase c, CoilFan fan, double start) {
        return rate(c, c, fan, start);
    }

    /**
     * A coil whose air pressure drop and capacity come from two views of it (see
     * {@link FoulingLevel}): the fan meets the hydraulic case's pressure drop, and the thermal
     * case is rated at the airflow found.
     *
     * @param hydraulic the case rated for the air pressure drop (its airflow is the starting guess)
     * @param thermal   the case rated for the capacity (the same case for a clean coil)
     * @param fan       the fan, or {@code null} to hold the case's airflow
     * @param start     starting guess for the flow [m3/s], or 0 for the case's own
     * @return the thermal rating at the operating airflow, with the hydraulic pressure drop
     */
    public static LoopRating rate(CoilCase hydraulic, CoilCase thermal, CoilFan fan, double start) {
        if (fan == null) {
            Rating h = CoilModels.rate(hydraulic);
            Rating t = hydraulic == thermal ? h : CoilModels.rate(thermal);
            return new LoopRating(t, h.airVolumeFlow(), h.airPressureDrop(), h.airPressureDrop(), Double.NaN, 0,
                    List.of());
        }
        CoilCase c = hydraulic;
        Warnings w = new Warnings();
        double q = start > 0 ? start : c.air().volumeFlow(c.coil().derive().faceArea());
        Rating r = at(c, q);
        double n = FIRST_EXPONENT;
        double qPrev = Double.NaN;
        double dpPrev = Double.NaN;
        for (int k = 1; k <= MAX_ITERATIONS; k++) {
            double qk = q;
            double dpk = r.airPressureDrop();
            if (!Double.isNaN(qPrev) && Math.abs(Math.log(qk / qPrev)) > 1e-9 && dpPrev > 0 && dpk > 0) {
                n = Math.max(1, Math.min(2.5, Math.log(dpk / dpPrev) / Math.log(qk / qPrev)));
            }
            double exponent = n;
            Warnings trial = new Warnings();
            CoilFan.Point p = fan.operate(flow -> dpk * Math.pow(Math.max(flow, 0) / qk, exponent), trial);
            double next = p.flow();
            if (!(next > 0)) {
                throw new org.finstack.core.InputException("fan", org.finstack.core.Msg.IMPOSSIBLE,
                        "cannot move air through this coil: its pressure drop exceeds the fan's shut-off pressure");
            }
            if (Math.abs(next - qk) <= FLOW_TOLERANCE * qk) {
                w.addAll(trial);
                Rating t = hydraulic == thermal ? r : at(thermal, qk);
                return new LoopRating(t, qk, r.airPressureDrop(), p.staticPressure(), p.electricalPower(), k,
                        unique(w.list()));
            }
            qPrev = qk;
            dpPrev = dpk;
            q = next;
            r = at(c, q);
        }
        throw new ConvergenceException("airflow where the fan curve meets the coil's pressure drop", MAX_ITERATIONS,
                Math.abs(q - qPrev) / q);
    }

    /**
     * @param c    a case
     * @param flow volume flow at the inlet state [m3/s]
     * @return the case rated at that flow
     */
    public static Rating at(CoilCase c, double flow) {
        AirInlet a = c.air();
        return CoilModels.rate(c.withAir(new AirInlet(a.temperature(), 0, flow, a.pressure(), a.relativeHumidity())));
    }

    private static List<String> unique(List<String> in) {
        Set<String> s = new LinkedHashSet<>(in);
        return new ArrayList<>(s);
    }

    /**
     * A coil rated with its fan in the loop.
     *
     * @param rating          the coil's (thermal) rating at the operating airflow
     * @param flow            operating volume flow [m3/s]
     * @param airPressureDrop the coil's (hydraulic) air pressure drop there [Pa]
     * @param fanPressure     fan static pressure there [Pa] (the coil's pressure drop without a fan)
     * @param fanPower        fan electrical power [W], or NaN when unknown (no fan, or a curve only)
     * @param ratings         coil ratings spent (0 without a fan)
     * @param warnings        the fan's warnings
     */
    public record LoopRating(Rating rating, double flow, double airPressureDrop, double fanPressure, double fanPower, int ratings,
            List<String> warnings) {

        /** Copies the list. */
        public LoopRating {
            warnings = List.copyOf(warnings);
        }
    }
}
