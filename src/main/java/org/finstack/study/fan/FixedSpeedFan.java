package org.finstack.study.fan;

import java.util.function.DoubleUnaryOperator;
import org.finstack.core.Check;
import org.finstack.core.Warnings;

/**
 * A generic fan on a fixed-speed motor: it runs where its characteristic, scaled to the design
 * point, meets the system curve. As the coil's resistance rises, the flow of every such fan
 * falls; the power of an axial propeller fan rises while that of a forward-curved centrifugal
 * falls (common practice; see {@link FanCharacteristic}).
 *
 * <p>Power: shaft power P = P_d lambda(Q/Q_d) with P_d = Q_d p_d / eta_d (fan laws,
 * {@link FanLaws}); electrical power P / eta_motor with a constant motor efficiency (a
 * simplification: small motors lose efficiency at part load).
 *
 * <p>Worked example: {@code axialPropeller(1.5, 60)} against dp = (60/1.5^2) Q^2 runs at its
 * design point, 1.5 m3/s and 60 Pa, with 225 W at the shaft and 346.15 W drawn.
 *
 * @param characteristic         the generic shape
 * @param designFlow             design flow [m3/s]
 * @param designStaticPressure   design static pressure [Pa]
 * @param designStaticEfficiency fan static efficiency at the design point [-], in (0, 1]
 * @param motorEfficiency        motor efficiency [-], in (0, 1]
 */
public record FixedSpeedFan(FanCharacteristic characteristic, double designFlow, double designStaticPressure,
        double designStaticEfficiency, double motorEfficiency) implements GenericFan {

    /** Typical static efficiency of a plate-mounted propeller fan at best efficiency [-]; common practice. */
    public static final double PROPELLER_STATIC_EFFICIENCY = 0.40;
    /** Typical efficiency of a small fixed-speed (permanent-split-capacitor) fan motor [-]; common practice. */
    public static final double SMALL_MOTOR_EFFICIENCY = 0.65;
    /** Typical static efficiency of a small forward-curved centrifugal fan at best efficiency [-]; common practice. */
    public static final double FORWARD_CURVED_STATIC_EFFICIENCY = 0.55;

    /** Validates the design point and efficiencies. */
    public FixedSpeedFan {
        if (characteristic == null) {
            throw new IllegalArgumentException("a fan needs a characteristic");
        }
        Check.positive("designFlow", designFlow);
        Check.positive("designStaticPressure", designStaticPressure);
        Check.positive("designStaticEfficiency", designStaticEfficiency);
        Check.within("designStaticEfficiency", designStaticEfficiency, 0, 1);
        Check.positive("motorEfficiency", motorEfficiency);
        Check.within("motorEfficiency", motorEfficiency, 0, 1);
    }

    /**
     * An axial propeller fan with typical efficiencies ({@link #PROPELLER_STATIC_EFFICIENCY},
     * {@link #SMALL_MOTOR_EFFICIENCY}).
     *
     * @param designFlow           design flow [m3/s]
     * @param designStaticPressure design static pressure [Pa]
     * @return the fan
     */
    public static FixedSpeedFan axialPropeller(double designFlow, double designStaticPressure) {
        return new FixedSpeedFan(FanCharacteristic.AXIAL_PROPELLER, designFlow, designStaticPressure,
                PROPELLER_STATIC_EFFICIENCY, SMALL_MOTOR_EFFICIENCY);
    }

    /**
     * A forward-curved centrifugal fan with typical efficiencies
     * ({@link #FORWARD_CURVED_STATIC_EFFICIENCY}, {@link #SMALL_MOTOR_EFFICIENCY}).
     *
     * @param designFlow           design flow [m3/s]
     * @param designStaticPressure design static pressure [Pa]
     * @return the fan
     */
    public static FixedSpeedFan forwardCurved(double designFlow, double designStaticPressure) {
        return new FixedSpeedFan(FanCharacteristic.FORWARD_CURVED, designFlow, designStaticPressure,
                FORWARD_CURVED_STATIC_EFFICIENCY, SMALL_MOTOR_EFFICIENCY);
    }

    /** @return the fan's static-pressure curve at its fixed speed */
    public FanCurve curve() {
        return characteristic.curve(designFlow, designStaticPressure, 1);
    }

    @Override
    public FanOperation operate(DoubleUnaryOperator system, Warnings warnings) {
        OperatingPoint op = curve().operatingPoint(system);
        characteristic.warnIfUnstable(op.flow() / designFlow, warnings);
        double shaft = characteristic.shaftPower(designFlow, designStaticPressure, designStaticEfficiency, 1,
                op.flow());
        return new FanOperation(op.flow(), op.staticPressure(), 1, shaft, shaft / motorEfficiency,
                Regulation.FIXED_SPEED);
    }
}
