package org.finstack.study.fan;

/**
 * Where a fan curve meets a system curve.
 *
 * @param flow           volume flow through fan and coil [m3/s]
 * @param staticPressure fan static pressure, equal to the system's pressure drop there [Pa]
 */
public record OperatingPoint(double flow, double staticPressure) {
}
