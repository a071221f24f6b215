package org.finstack.study.fan;

import java.util.Locale;
import org.finstack.core.Check;
import org.finstack.core.Numbers;
import org.finstack.core.Warnings;

/**
 * A generic fan type's dimensionless characteristic, normalised on its design point: against
 * the flow ratio x = Q / (Q_d n) it gives the pressure ratio psi = p / (p_d n^2) and the
 * power ratio lambda = P / (P_d n^3), where Q_d, p_d and P_d are the design flow, static pressure
 * and shaft power at design speed and n the speed over design speed. By the fan laws
 * ({@link FanLaws}) one such curve describes the fan at every speed. Each characteristic passes
 * through (x, psi, lambda) = (1, 1, 1), its design point and best-efficiency point, runs from
 * shut-off (x = 0) to free delivery (psi = 0), and is joined by monotone cubic interpolation
 * ({@link FritschCarlson1980MonotoneCubic}).
 *
 * <p><b>Basis of the shapes.</b> The three tables below are typical shapes (common practice),
 * drawn to show what practitioners know of each type: the axial propeller fan has a steep
 * pressure curve and draws most power near shut-off; the forward-curved centrifugal has a flat
 * pressure curve and a power that rises steeply with flow (an "overloading" fan); the
 * backward-curved centrifugal has a power curve with a maximum near best efficiency
 * ("non-overloading"). They follow the qualitative curve sketches of the fan types in the ASHRAE
 * Handbook Fans chapter (from memory) but no number is read from any figure or any maker's data.
 * The stall or surge dip of real curves left of best efficiency is smoothed into a non-increasing
 * curve; an operating point left of {@link #stableFrom()} adds a warning.
 */
public final class FanCharacteristic {

    /**
     * Axial propeller fan (plate-mounted, as on air-cooled condensers): shut-off pressure about
     * 2.6 times, free delivery 1.4 times the design values; power highest at shut-off
     * (typical shape, common practice).
     */
    public static final FanCharacteristic AXIAL_PROPELLER = new FanCharacteristic("axial propeller fan",
            new double[] {0.0, 0.2, 0.4, 0.6, 0.8, 1.0, 1.2, 1.4}, // flow ratio x; typical shape, common practice
            new double[] {2.60, 2.25, 1.95, 1.65, 1.33, 1.00, 0.55, 0.0}, // psi; idem
            new double[] {1.45, 1.38, 1.30, 1.20, 1.10, 1.00, 0.88, 0.75}, // lambda; idem
            0.6); // stall dip left of about 60 % of design flow; common practice

    /**
     * Forward-curved centrifugal fan on a fixed-speed motor: shut-off pressure about 1.3 times,
     * free delivery 2 times the design values; power rising with flow (typical shape, common
     * practice).
     */
    public static final FanCharacteristic FORWARD_CURVED = new FanCharacteristic(
            "forward-curved centrifugal fan",
            new double[] {0.0, 0.25, 0.5, 0.75, 1.0, 1.25, 1.5, 1.75, 2.0}, // x; typical shape, common practice
            new double[] {1.30, 1.28, 1.22, 1.12, 1.00, 0.82, 0.58, 0.30, 0.0}, // psi; idem
            new double[] {0.42, 0.52, 0.68, 0.86, 1.00, 1.22, 1.44, 1.64, 1.80}, // lambda; idem
            0.5); // surge region left of the pressure peak, about half the design flow; common practice

    /**
     * Backward-curved centrifugal impeller, as used in EC fans: shut-off pressure about 1.45
     * times, free delivery 1.7 times the design values; power with a flat maximum near design
     * (typical shape, common practice).
     */
    public static final FanCharacteristic BACKWARD_CURVED = new FanCharacteristic(
            "backward-curved centrifugal fan",
            new double[] {0.0, 0.25, 0.5, 0.75, 1.0, 1.25, 1.5, 1.7}, // x; typical shape, common practice
            new double[] {1.45, 1.45, 1.38, 1.23, 1.00, 0.70, 0.33, 0.0}, // psi; idem
            new double[] {0.55, 0.68, 0.82, 0.94, 1.00, 0.98, 0.90, 0.80}, // lambda; idem
            0.5); // unstable left of the pressure peak; common practice

    private final String name;
    private final FanCurve shape;
    private final double stableFrom;
    private final FritschCarlson1980MonotoneCubic lambda;

    private FanCharacteristic(String name, double[] x, double[] psi, double[] lambda, double stableFrom) {
        this.name = name;
        this.shape = new FanCurve(x, psi);
        this.stableFrom = stableFrom;
        this.lambda = new FritschCarlson1980MonotoneCubic(name + ".lambda", x, lambda);
    }

    /** @return the fan type's name, e.g. "axial propeller fan" */
    public String name() {
        return name;
    }

    /** @return the flow ratio at free delivery (psi = 0) [-] */
    public double freeDeliveryRatio() {
        return shape.maxFlow();
    }

    /** @return the flow ratio left of which a real fan of this type may stall or surge [-] */
    public double stableFrom() {
        return stableFrom;
    }

    /** @return the pressure ratio at shut-off, p(0)/p_d at design speed [-] */
    public double shutOffRatio() {
        return shape.shutOffPressure();
    }

    /**
     * The fan's static-pressure curve at one speed.
     *
     * @param designFlow     design flow at design speed [m3/s]
     * @param designPressure design static pressure at design speed [Pa]
     * @param speedRatio     speed over design speed [-]
     * @return the curve, from shut-off to free delivery
     */
    public FanCurve curve(double designFlow, double designPressure, double speedRatio) {
        Check.positive("designFlow", designFlow);
        Check.positive("designStaticPressure", designPressure);
        Check.positive("speedRatio", speedRatio);
        double[] q = shape.flows();
        double[] p = shape.pressures();
        for (int i = 0; i < q.length; i++) {
            q[i] *= designFlow;
            p[i] *= designPressure;
        }
        return new FanCurve(q, p).atSpeedRatio(speedRatio);
    }

    /**
     * @param flowRatio x = Q / (Q_d n), within [0, {@link #freeDeliveryRatio()}] [-]
     * @return psi = p / (p_d n^2) [-]
     */
    public double pressureRatio(double flowRatio) {
        return shape.pressure(flowRatio);
    }

    /**
     * @param flowRatio x = Q / (Q_d n), within [0, {@link #freeDeliveryRatio()}] [-]
     * @return lambda = P / (P_d n^3) [-]
     */
    public double powerRatio(double flowRatio) {
        return lambda.value(flowRatio);
    }

    /**
     * Shaft power at an operating point, by the fan laws from the design point.
     *
     * @param designFlow       design flow at design speed [m3/s]
     * @param designPressure   design static pressure at design speed [Pa]
     * @param designEfficiency fan static efficiency at the design point [-]
     * @param speedRatio       speed over design speed [-]
     * @param flow             flow at the operating point [m3/s]
     * @return P = P_d n^3 lambda(Q / (Q_d n)) with P_d = Q_d p_d / eta_d [W]
     */
    public double shaftPower(double designFlow, double designPressure, double designEfficiency,
            double speedRatio, double flow) {
        Check.positive("designFlow", designFlow);
        Check.positive("designStaticPressure", designPressure);
        Check.positive("designStaticEfficiency", designEfficiency);
        Check.within("designStaticEfficiency", designEfficiency, 0, 1);
        Check.positive("speedRatio", speedRatio);
        Check.nonNegative("flow", flow);
        double designPower = designFlow * designPressure / designEfficiency;
        double ratio = Math.min(flow / (designFlow * speedRatio), freeDeliveryRatio());
        return FanLaws.power(designPower * powerRatio(ratio), speedRatio);
    }

    /**
     * Adds a warning when an operating point lies left of {@link #stableFrom()}.
     *
     * @param flowRatio x = Q / (Q_d n) at the operating point [-]
     * @param warnings  where the warning goes
     */
    void warnIfUnstable(double flowRatio, Warnings warnings) {
        if (flowRatio < stableFrom) {
            warnings.add(String.format(Locale.ROOT, "generic %s: the operating point lies at %s %% of the"
                    + " flow at this speed's design point, left of about %s %% where a real fan of this"
                    + " type may stall or surge; the generic curve is smoothed there",
                    name, Numbers.brief(100 * flowRatio), Numbers.brief(100 * stableFrom)));
        }
    }

    @Override
    public String toString() {
        return name;
    }
}
