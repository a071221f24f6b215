package org.finstack.study.fan;

import java.util.function.DoubleUnaryOperator;
import org.finstack.core.Warnings;

/**
 * A fan of a generic type, known only by its design point, for when no maker's curve is at hand:
 * its operating point and power draw against a coil's system curve. The types respond
 * differently as the coil's resistance rises (e.g. with dirt or frost): see
 * {@link FixedSpeedFan} and {@link ConstantAirflowEcFan}.
 */
public sealed interface GenericFan permits FixedSpeedFan, ConstantAirflowEcFan {

    /**
     * @param system   the coil's static pressure drop dp(Q) [Pa] against flow [m3/s], rising
     *                 with Q, not negative
     * @param warnings where a warning goes when the fan runs where a real fan of its type may be
     *                 unstable, or when an EC fan reaches a limit
     * @return the operating point with its power draw
     */
    FanOperation operate(DoubleUnaryOperator system, Warnings warnings);

    /** @return the generic characteristic the fan follows */
    FanCharacteristic characteristic();
}
