package org.finstack.study.cost;

import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The saturation-temperature shift that a fouled coil forces when the plant keeps its duty.
 * A coil's duty is Q = UA dT with dT its mean difference between saturation and air; dirt that
 * cuts UA (and so the capacity at fixed temperatures) by the fraction f leaves
 * UA' = (1 - f) UA, and the same Q then needs dT' = dT / (1 - f): a condensing temperature
 * higher, or an evaporating temperature lower, by
 * <pre>
 *   shift = dT f / (1 - f)
 * </pre>
 * (the small rise of a condenser's heat rejection with the extra compressor power is neglected,
 * as is the change of the air-side temperature difference's shape).
 *
 * <p>Worked example: a 20 % capacity loss on a condenser with a clean difference of 15 K raises
 * the condensing temperature by 3.75 K.
 */
public final class SaturationShift {

    private SaturationShift() {
    }

    /**
     * @param capacityLoss               f, the fraction of UA (capacity at fixed temperatures) lost [-], in [0, 1)
     * @param cleanTemperatureDifference mean saturation-to-air difference of the clean coil [K]
     * @return the shift of the saturation temperature away from the air [K]
     */
    public static double fromCapacityLoss(double capacityLoss, double cleanTemperatureDifference) {
        Check.nonNegative("capacityLoss", capacityLoss);
        if (!(capacityLoss < 1)) {
            throw new InputException("capacityLoss", Msg.NOT_BELOW, capacityLoss, 1.0);
        }
        Check.positive("cleanTemperatureDifference", cleanTemperatureDifference);
        return cleanTemperatureDifference * capacityLoss / (1 - capacityLoss);
    }
}
