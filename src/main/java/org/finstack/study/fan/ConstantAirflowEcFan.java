package org.finstack.study.fan;

import java.util.Locale;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.finstack.core.Check;
import org.finstack.core.ConvergenceException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.core.Warnings;

/**
 * A constant-airflow fan with an electronically commutated (EC) motor and a backward-curved
 * impeller ({@link FanCharacteristic#BACKWARD_CURVED}): its controller sets the speed so that
 * the flow stays at the set flow (the design flow) whatever the coil's resistance, until the
 * speed reaches its maximum or the electrical power its maximum; beyond that the flow falls.
 *
 * <p>Speed to hold the set flow Q_s against the system's dp_s = dp(Q_s): the root n of
 * {@code n^2 p_d psi(1/n) = dp_s} on [1/x_free, n_max] (rising in n; Brent's method). At
 * n_max the fan runs on its n_max curve. When the electrical power
 * {@code P_el = P_d n^3 lambda(Q/(Q_d n)) / eta_drive} (fan laws, {@link FanLaws}) exceeds the
 * maximum, the speed is lowered to the root of {@code P_el(n) = P_max} along the system curve.
 * The drive efficiency (motor and electronics) is taken constant, a simplification.
 *
 * <p>Worked example: {@code typical(1.0, 100, 1.3, 500)} holds 1.0 m3/s against
 * dp = 100 Q^2 at design speed with 196.08 W drawn; against dp = 300 Q^2 it reaches its maximum
 * speed (1.3 times design) and the flow falls to 0.85416 m3/s.
 *
 * @param designFlow             set flow, equal to the design flow [m3/s]
 * @param designStaticPressure   static pressure at the design point at design speed [Pa]
 * @param designStaticEfficiency fan static efficiency at the design point [-], in (0, 1]
 * @param driveEfficiency        efficiency of EC motor and electronics [-], in (0, 1]
 * @param maxSpeedRatio          maximum speed over design speed [-], at least 1
 * @param maxElectricalPower     maximum electrical power [W]
 */
public record ConstantAirflowEcFan(double designFlow, double designStaticPressure, double designStaticEfficiency,
        double driveEfficiency, double maxSpeedRatio, double maxElectricalPower) implements GenericFan {

    /** Typical static efficiency of a backward-curved EC fan at best efficiency [-]; common practice. */
    public static final double STATIC_EFFICIENCY = 0.60;
    /** Typical efficiency of an EC motor with its electronics [-]; common practice. */
    public static final double DRIVE_EFFICIENCY = 0.85;

    /** Most evaluations spent on one speed. */
    public static final int MAX_EVALUATIONS = 200;

    /** Tolerance on the speed ratio [-]. */
    public static final double SPEED_TOLERANCE = 1e-12;

    /** Validates the design point and limits. */
    public ConstantAirflowEcFan {
        Check.positive("designFlow", designFlow);
        Check.positive("designStaticPressure", designStaticPressure);
        Check.positive("designStaticEfficiency", designStaticEfficiency);
        Check.within("designStaticEfficiency", designStaticEfficiency, 0, 1);
        Check.positive("driveEfficiency", driveEfficiency);
        Check.within("driveEfficiency", driveEfficiency, 0, 1);
        Check.finite("maxSpeedRatio", maxSpeedRatio);
        if (maxSpeedRatio < 1) {
            throw new InputException("maxSpeedRatio", Msg.IMPOSSIBLE,
                    "must be at least 1 (the design point is at design speed), got " + Numbers.brief(maxSpeedRatio));
        }
        Check.positive("maxElectricalPower", maxElectricalPower);
    }

    /**
     * An EC fan with typical efficiencies ({@link #STATIC_EFFICIENCY}, {@link #DRIVE_EFFICIENCY}).
     *
     * @param designFlow           set (design) flow [m3/s]
     * @param designStaticPressure design static pressure [Pa]
     * @param maxSpeedRatio        maximum speed over design speed [-]
     * @param maxElectricalPower   maximum electrical power [W]
     * @return the fan
     */
    public static ConstantAirflowEcFan typical(double designFlow, double designStaticPressure, double maxSpeedRatio,
            double maxElectricalPower) {
        return new ConstantAirflowEcFan(designFlow, designStaticPressure, STATIC_EFFICIENCY, DRIVE_EFFICIENCY,
                maxSpeedRatio, maxElectricalPower);
    }

    @Override
    public FanCharacteristic characteristic() {
        return FanCharacteristic.BACKWARD_CURVED;
    }

    @Override
    public FanOperation operate(DoubleUnaryOperator system, Warnings warnings) {
        FanCharacteristic ch = characteristic();
        double dpSet = system.applyAsDouble(designFlow);
        Check.nonNegative("systemCurve", dpSet);
        double nLo = 1 / ch.freeDeliveryRatio();
        UnivariateFunction holding = n -> n * n * designStaticPressure
                * ch.pressureRatio(Math.min(1 / n, ch.freeDeliveryRatio())) - dpSet;
        FanOperation op;
        double hMax = holding.value(maxSpeedRatio);
        if (hMax >= 0) {
            double n = dpSet == 0 ? nLo : hMax == 0 ? maxSpeedRatio : solve(holding, nLo, maxSpeedRatio, "EC fan speed");
            op = at(n, designFlow, dpSet, Regulation.HOLDING_FLOW);
        } else {
            op = running(maxSpeedRatio, system, Regulation.AT_MAX_SPEED);
        }
        if (op.electricalPower() > maxElectricalPower) {
            op = powerLimited(op.speedRatio(), system);
        }
        ch.warnIfUnstable(op.flow() / (designFlow * op.speedRatio()), warnings);
        if (op.regulation() != Regulation.HOLDING_FLOW) {
            warnings.add(String.format(Locale.ROOT, "constant-airflow EC fan at its %s (speed %s times design):"
                    + " the flow falls to %s %% of the set flow",
                    op.regulation() == Regulation.AT_MAX_SPEED ? "maximum speed" : "maximum power",
                    Numbers.brief(op.speedRatio()), Numbers.brief(100 * op.flow() / designFlow)));
        }
        return op;
    }

    private FanOperation powerLimited(double nHigh, DoubleUnaryOperator system) {
        UnivariateFunction excess = n -> running(n, system, Regulation.AT_MAX_POWER).electricalPower()
                - maxElectricalPower;
        double nLow = nHigh;
        int halvings = 0;
        while (excess.value(nLow) >= 0) {
            nLow *= 0.5;
            if (++halvings > 60) {
                throw new ConvergenceException("EC fan speed at maximum power (bracket)", halvings,
                        excess.value(nLow));
            }
        }
        double n = solve(excess, nLow, nHigh, "EC fan speed at maximum power");
        return running(n, system, Regulation.AT_MAX_POWER);
    }

    /** The fan at speed n where its curve meets the system curve (at shut-off if it cannot move air). */
    private FanOperation running(double n, DoubleUnaryOperator system, Regulation regulation) {
        FanCurve curve = characteristic().curve(designFlow, designStaticPressure, n);
        double dp0 = system.applyAsDouble(0);
        Check.nonNegative("systemCurve", dp0);
        if (dp0 >= curve.shutOffPressure() && regulation == Regulation.AT_MAX_POWER) {
            return at(n, 0, curve.shutOffPressure(), regulation);
        }
        OperatingPoint p = curve.operatingPoint(system);
        return at(n, p.flow(), p.staticPressure(), regulation);
    }

    private FanOperation at(double n, double flow, double pressure, Regulation regulation) {
        double shaft = characteristic().shaftPower(designFlow, designStaticPressure, designStaticEfficiency, n, flow);
        return new FanOperation(flow, pressure, n, shaft, shaft / driveEfficiency, regulation);
    }

    private static double solve(UnivariateFunction f, double lo, double hi, String quantity) {
        double[] last = {Double.NaN};
        BrentSolver solver = new BrentSolver(SPEED_TOLERANCE, SPEED_TOLERANCE, 0.0);
        try {
            return solver.solve(MAX_EVALUATIONS, n -> {
                last[0] = f.value(n);
                return last[0];
            }, lo, hi);
        } catch (TooManyEvaluationsException e) {
            throw new ConvergenceException(quantity, MAX_EVALUATIONS, Math.abs(last[0]));
        }
    }
}
