package org.finstack.study.fan;

import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.ConvergenceException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;

/**
 * A fan's static pressure against volume flow, given as points and joined by monotone cubic
 * interpolation ({@link FritschCarlson1980MonotoneCubic}), so that the curve never rises between
 * two points nor overshoots them.
 *
 * <p>Points: at least two, flows [m3/s] not negative and strictly increasing, static pressures
 * [Pa] not negative and non-increasing with flow. The curve is used only between its first and
 * last point: <b>a flow beyond the curve's end is refused</b> ({@link InputException}), never
 * extrapolated; an operating point that would lie beyond the last point is refused likewise,
 * with the advice to extend the curve to free delivery.
 *
 * <p>The operating point against a system curve dp(Q) (rising with Q) is the root of
 * {@code p_fan(Q) - dp(Q) = 0}, which is strictly decreasing and so has at most one root on the
 * curve; it is found by Brent's method (Commons Math {@link BrentSolver}) within at most
 * {@link #MAX_EVALUATIONS} evaluations to {@link #FLOW_TOLERANCE} of the curve's flow span.
 *
 * <p>Worked example: the straight curve (0, 250 Pa), (2 m3/s, 0) against dp = 60 Q^2 meets it at
 * Q = 1.25 m3/s, p = 93.75 Pa (the positive root of 60 Q^2 + 125 Q - 250 = 0).
 */
public final class FanCurve {

    /** The interpolation's source. */
    public static final Citation SOURCE = FritschCarlson1980MonotoneCubic.SOURCE;

    /** Most evaluations of the system curve spent on one operating point. */
    public static final int MAX_EVALUATIONS = 200;

    /** Flow tolerance of the operating point, relative to the curve's last flow [-]. */
    public static final double FLOW_TOLERANCE = 1e-12;

    private static final String FIELD = "fan.curve";
    private static final String SYSTEM = "systemCurve";

    private final double[] flows;
    private final double[] pressures;
    private final FritschCarlson1980MonotoneCubic interpolant;

    /**
     * @param flows     volume flows [m3/s], not negative, strictly increasing, at least two
     * @param pressures static pressures [Pa] at those flows, not negative, non-increasing
     * @throws InputException naming the offending point, e.g. {@code fan.curve[2].pressure}
     */
    public FanCurve(double[] flows, double[] pressures) {
        if (flows.length != pressures.length) {
            throw new InputException(FIELD, Msg.IMPOSSIBLE, "needs a pressure for every flow, got "
                    + flows.length + " flows and " + pressures.length + " pressures");
        }
        if (flows.length < 2) {
            throw new InputException(FIELD, Msg.IMPOSSIBLE, "needs at least 2 points, got " + flows.length);
        }
        for (int i = 0; i < flows.length; i++) {
            String at = FIELD + "[" + i + "]";
            Check.nonNegative(at + ".flow", flows[i]);
            Check.nonNegative(at + ".pressure", pressures[i]);
            if (i > 0 && !(flows[i] > flows[i - 1])) {
                throw new InputException(at + ".flow", Msg.NOT_ABOVE, flows[i], flows[i - 1]);
            }
            if (i > 0 && pressures[i] > pressures[i - 1]) {
                throw new InputException(at + ".pressure", Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                        "must not rise above the previous point's %s Pa (a fan's static pressure falls"
                                + " as its flow rises), got %s Pa",
                        Numbers.brief(pressures[i - 1]), Numbers.brief(pressures[i])));
            }
        }
        this.flows = flows.clone();
        this.pressures = pressures.clone();
        this.interpolant = new FritschCarlson1980MonotoneCubic(FIELD, this.flows, this.pressures);
    }

    /** @return a copy of the flows [m3/s] */
    public double[] flows() {
        return flows.clone();
    }

    /** @return a copy of the static pressures [Pa] */
    public double[] pressures() {
        return pressures.clone();
    }

    /** @return the first point's flow [m3/s] (zero for a curve that starts at shut-off) */
    public double minFlow() {
        return flows[0];
    }

    /** @return the last point's flow [m3/s], the end of the curve */
    public double maxFlow() {
        return flows[flows.length - 1];
    }

    /** @return the static pressure at the first point [Pa]; the shut-off pressure when it is at zero flow */
    public double shutOffPressure() {
        return pressures[0];
    }

    /**
     * @param flow volume flow [m3/s], within the curve's points
     * @return static pressure [Pa]
     * @throws InputException ({@code fan.flow}) if the flow lies outside the curve (no extrapolation)
     */
    public double pressure(double flow) {
        Check.within("fan.flow", flow, minFlow(), maxFlow());
        return interpolant.value(flow);
    }

    /**
     * The same fan at another speed, by the fan laws: every flow times n, every pressure times n^2.
     *
     * @param speedRatio new speed over the curve's speed [-], greater than zero
     * @return the scaled curve
     */
    public FanCurve atSpeedRatio(double speedRatio) {
        Check.positive("speedRatio", speedRatio);
        double[] q = new double[flows.length];
        double[] p = new double[flows.length];
        for (int i = 0; i < flows.length; i++) {
            q[i] = FanLaws.flow(flows[i], speedRatio);
            p[i] = FanLaws.pressure(pressures[i], speedRatio);
        }
        return new FanCurve(q, p);
    }

    /**
     * Intersection with a system curve.
     *
     * @param system the coil's (and ducting's) static pressure drop dp(Q) [Pa] against flow
     *               [m3/s]: finite, not negative, rising with Q
     * @return the operating point
     * @throws InputException ({@code systemCurve}) if the system curve gives a non-finite or
     *                        negative value, if it lies above the fan at the curve's first point
     *                        ("the fan cannot move air through this coil"), or if the fan still
     *                        exceeds it at the curve's last point (the intersection would need
     *                        extrapolation)
     * @throws ConvergenceException if the root is not found within {@link #MAX_EVALUATIONS}
     */
    public OperatingPoint operatingPoint(DoubleUnaryOperator system) {
        double qLo = minFlow();
        double qHi = maxFlow();
        double gLo = pressures[0] - systemAt(system, qLo);
        if (gLo < 0) {
            String where = qLo == 0
                    ? String.format(Locale.ROOT, "its pressure drop at zero flow, %s Pa, is above the"
                            + " fan's shut-off pressure %s Pa", Numbers.brief(systemAt(system, 0)),
                            Numbers.brief(pressures[0]))
                    : String.format(Locale.ROOT, "at the curve's first point, %s m3/s, the coil needs"
                            + " %s Pa and the fan gives only %s Pa (the curve does not reach shut-off)",
                            Numbers.brief(qLo), Numbers.brief(systemAt(system, qLo)), Numbers.brief(pressures[0]));
            throw new InputException(SYSTEM, Msg.IMPOSSIBLE,
                    "the fan cannot move air through this coil: " + where);
        }
        if (gLo == 0) {
            return new OperatingPoint(qLo, pressures[0]);
        }
        double sHi = systemAt(system, qHi);
        double gHi = pressures[pressures.length - 1] - sHi;
        if (gHi > 0) {
            throw new InputException(SYSTEM, Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                    "the operating point lies beyond the fan curve's last point: at %s m3/s the fan still"
                            + " gives %s Pa against the coil's %s Pa; extend the curve towards free"
                            + " delivery (curves are not extrapolated)",
                    Numbers.brief(qHi), Numbers.brief(pressures[pressures.length - 1]), Numbers.brief(sHi)));
        }
        if (gHi == 0) {
            return new OperatingPoint(qHi, sHi);
        }
        double[] last = {Double.NaN};
        BrentSolver solver = new BrentSolver(FLOW_TOLERANCE, FLOW_TOLERANCE * qHi, 0.0);
        double q;
        try {
            q = solver.solve(MAX_EVALUATIONS, flow -> {
                double g = interpolant.value(flow) - systemAt(system, flow);
                last[0] = g;
                return g;
            }, qLo, qHi);
        } catch (TooManyEvaluationsException e) {
            throw new ConvergenceException("fan operating point (flow)", MAX_EVALUATIONS, Math.abs(last[0]));
        }
        return new OperatingPoint(q, interpolant.value(q));
    }

    private static double systemAt(DoubleUnaryOperator system, double flow) {
        double dp = system.applyAsDouble(flow);
        if (!Double.isFinite(dp)) {
            throw new InputException(SYSTEM, Msg.NOT_A_NUMBER, dp);
        }
        if (dp < 0) {
            throw new InputException(SYSTEM, Msg.NEGATIVE, dp);
        }
        return dp;
    }
}
