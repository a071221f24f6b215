package org.finstack.study.fan;

/**
 * A generic fan running against a system curve.
 *
 * @param flow            volume flow [m3/s]
 * @param staticPressure  fan static pressure, equal to the system's pressure drop [Pa]
 * @param speedRatio      speed over design speed [-] (1 for a fixed-speed fan)
 * @param shaftPower      power at the fan shaft [W]
 * @param electricalPower power drawn by motor and drive [W]
 * @param regulation      how the fan reached this point
 */
public record FanOperation(double flow, double staticPressure, double speedRatio, double shaftPower,
        double electricalPower, Regulation regulation) {

    /** @return fan static efficiency Q p / P_shaft [-] */
    public double staticEfficiency() {
        return flow * staticPressure / shaftPower;
    }
}
