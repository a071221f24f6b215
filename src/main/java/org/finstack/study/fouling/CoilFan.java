package org.finstack.study.fouling;

import java.util.function.DoubleUnaryOperator;
import org.finstack.core.Warnings;
import org.finstack.study.fan.FanCurve;
import org.finstack.study.fan.FanOperation;
import org.finstack.study.fan.GenericFan;
import org.finstack.study.fan.OperatingPoint;

/**
 * The fan that moves the air through a coil: a maker's static-pressure curve, or a generic fan
 * known by its design point. Its static pressure is taken to be spent on the coil alone (ducts,
 * grilles and casing losses are not modelled).
 */
public sealed interface CoilFan permits CoilFan.Curve, CoilFan.Generic {

    /**
     * The fan against a system curve.
     *
     * @param system   the coil's pressure drop dp(Q) [Pa] against volume flow [m3/s], rising
     * @param warnings where fan warnings go
     * @return flow [m3/s], static pressure [Pa] and, where known, electrical power [W]
     */
    Point operate(DoubleUnaryOperator system, Warnings warnings);

    /** @return a short description for the output */
    String describe();

    /**
     * A fan's operating point.
     *
     * @param flow            volume flow [m3/s]
     * @param staticPressure  static pressure [Pa]
     * @param electricalPower power drawn [W], or NaN when the fan is known only by a pressure curve
     */
    record Point(double flow, double staticPressure, double electricalPower) {

        /** @return whether the power is known */
        public boolean hasPower() {
            return !Double.isNaN(electricalPower);
        }
    }

    /**
     * A fan given by its static-pressure curve (no power curve).
     *
     * @param curve the curve
     */
    record Curve(FanCurve curve) implements CoilFan {
        @Override
        public Point operate(DoubleUnaryOperator system, Warnings warnings) {
            OperatingPoint p = curve.operatingPoint(system);
            return new Point(p.flow(), p.staticPressure(), Double.NaN);
        }

        @Override
        public String describe() {
            return "fan curve of " + curve.flows().length + " points";
        }
    }

    /**
     * A generic fan known by its design point.
     *
     * @param fan the fan
     */
    record Generic(GenericFan fan) implements CoilFan {
        @Override
        public Point operate(DoubleUnaryOperator system, Warnings warnings) {
            FanOperation op = fan.operate(system, warnings);
            return new Point(op.flow(), op.staticPressure(), op.electricalPower());
        }

        @Override
        public String describe() {
            return "generic " + fan.characteristic().name();
        }
    }
}
