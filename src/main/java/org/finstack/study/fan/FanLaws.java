package org.finstack.study.fan;

import org.finstack.core.Check;
import org.finstack.core.Citation;

/**
 * The fan laws: how one fan's performance at a point of rating scales with speed N, size D and
 * air density rho, for geometrically similar fans at the same point on their dimensionless
 * characteristic (same flow coefficient):
 * <pre>
 *   Q2 = Q1 (N2/N1)   (D2/D1)^3
 *   p2 = p1 (N2/N1)^2 (D2/D1)^2 (rho2/rho1)
 *   P2 = P1 (N2/N1)^3 (D2/D1)^5 (rho2/rho1)
 * </pre>
 * with Q the volume flow [m3/s], p a pressure (static or total) [Pa] and P the shaft power [W].
 * The efficiency is the same at both points. The laws are exact for similar fans at equal
 * Reynolds and Mach numbers; in practice small changes of size and speed shift the efficiency a
 * little (the source states no numeric range, so no validity limits are checked).
 *
 * <p>Worked example: a fan moving 1.0 m3/s at 120 Pa with 250 W, run at 1.2 times its speed,
 * moves 1.2 m3/s at 172.8 Pa with 432 W.
 */
public final class FanLaws {

    /** The laws' source. */
    public static final Citation SOURCE = Citation.of("ASHRAE 2020, Fans",
            "ASHRAE, 2020, ASHRAE Handbook - HVAC Systems and Equipment, chapter 21 \"Fans\","
                    + " section Fan Laws (chapter and table numbering from memory); the same laws in"
                    + " AMCA Publication 201, Fans and Systems");

    private FanLaws() {
    }

    /**
     * @param flow       flow at the first speed [m3/s]
     * @param speedRatio N2/N1 [-]
     * @return flow at the second speed [m3/s]
     */
    public static double flow(double flow, double speedRatio) {
        return flow(flow, speedRatio, 1);
    }

    /**
     * @param pressure   pressure at the first speed [Pa]
     * @param speedRatio N2/N1 [-]
     * @return pressure at the second speed, same air [Pa]
     */
    public static double pressure(double pressure, double speedRatio) {
        return pressure(pressure, speedRatio, 1, 1);
    }

    /**
     * @param power      shaft power at the first speed [W]
     * @param speedRatio N2/N1 [-]
     * @return shaft power at the second speed, same air [W]
     */
    public static double power(double power, double speedRatio) {
        return power(power, speedRatio, 1, 1);
    }

    /**
     * @param flow          flow of fan 1 [m3/s]
     * @param speedRatio    N2/N1 [-]
     * @param diameterRatio D2/D1 [-]
     * @return flow of fan 2 [m3/s]
     */
    public static double flow(double flow, double speedRatio, double diameterRatio) {
        Check.nonNegative("flow", flow);
        Check.positive("speedRatio", speedRatio);
        Check.positive("diameterRatio", diameterRatio);
        return flow * speedRatio * Math.pow(diameterRatio, 3);
    }

    /**
     * @param pressure      pressure of fan 1 [Pa]
     * @param speedRatio    N2/N1 [-]
     * @param diameterRatio D2/D1 [-]
     * @param densityRatio  rho2/rho1 [-]
     * @return pressure of fan 2 [Pa]
     */
    public static double pressure(double pressure, double speedRatio, double diameterRatio,
            double densityRatio) {
        Check.nonNegative("pressure", pressure);
        Check.positive("speedRatio", speedRatio);
        Check.positive("diameterRatio", diameterRatio);
        Check.positive("densityRatio", densityRatio);
        return pressure * speedRatio * speedRatio * diameterRatio * diameterRatio * densityRatio;
    }

    /**
     * @param power         shaft power of fan 1 [W]
     * @param speedRatio    N2/N1 [-]
     * @param diameterRatio D2/D1 [-]
     * @param densityRatio  rho2/rho1 [-]
     * @return shaft power of fan 2 [W]
     */
    public static double power(double power, double speedRatio, double diameterRatio, double densityRatio) {
        Check.nonNegative("power", power);
        Check.positive("speedRatio", speedRatio);
        Check.positive("diameterRatio", diameterRatio);
        Check.positive("densityRatio", densityRatio);
        return power * Math.pow(speedRatio, 3) * Math.pow(diameterRatio, 5) * densityRatio;
    }

    /**
     * The speed ratio that moves a fan from one flow to another (same fan, same air).
     *
     * @param flow1 flow at the first speed [m3/s], greater than zero
     * @param flow2 wanted flow [m3/s], greater than zero
     * @return N2/N1 [-]
     */
    public static double speedRatioForFlow(double flow1, double flow2) {
        Check.positive("flow1", flow1);
        Check.positive("flow2", flow2);
        return flow2 / flow1;
    }
}
