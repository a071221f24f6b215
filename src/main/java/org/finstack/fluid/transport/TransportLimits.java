package org.finstack.fluid.transport;

import java.util.Map;
import org.finstack.core.Check;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.OutOfRangeException;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.Phase;

/**
 * The checks shared by the transport back ends: a state must be given, single-phase and inside the
 * temperature range of the fluid's equation of state; a surface tension is asked for from that
 * range's lower end up to the critical temperature.
 */
final class TransportLimits {

    private final String name;
    private final double tMin;
    private final double tMax;
    private final double tc;
    private final String twoPhase;
    private final String surfaceTensionTemperature;

    /**
     * @param name                      the fluid's name, for messages
     * @param info                      the fluid's constants (range and critical temperature)
     * @param twoPhase                  why a two-phase state is refused, and what to take instead
     * @param surfaceTensionTemperature what the temperature of a surface tension is called in
     *                                  messages, with its unit
     */
    TransportLimits(String name, FluidInfo info, String twoPhase, String surfaceTensionTemperature) {
        this.name = name;
        this.twoPhase = twoPhase;
        this.surfaceTensionTemperature = surfaceTensionTemperature;
        this.tMin = info.minTemperature();
        this.tMax = info.maxTemperature();
        this.tc = info.criticalTemperature();
    }

    /**
     * @param state the state asked about
     * @throws InputException       if the state is missing
     * @throws FinstackException    if it is two-phase
     * @throws OutOfRangeException  if its temperature is outside the range
     */
    void checkState(FluidState state) {
        if (state == null) {
            throw new InputException("state", Msg.MISSING);
        }
        if (state.phase() == Phase.TWO_PHASE) {
            throw new FinstackException(Msg.IMPOSSIBLE, twoPhase);
        }
        double t = state.temperature();
        if (t < tMin || t > tMax) {
            throw new OutOfRangeException(Msg.FLUID_OUT_OF_RANGE, name, "T [K]", t,
                    plain(tMin) + " K to " + plain(tMax) + " K");
        }
    }

    /**
     * @param temperature the temperature of a surface tension [K]
     * @throws OutOfRangeException if it is outside the range up to Tc
     */
    void checkSurfaceTensionTemperature(double temperature) {
        Check.finite("temperature", temperature);
        if (temperature < tMin || temperature > tc) {
            throw new OutOfRangeException(Msg.FLUID_OUT_OF_RANGE, name, surfaceTensionTemperature, temperature,
                    plain(tMin) + " K to " + plain(tc) + " K");
        }
    }

    /**
     * @param table stated maximum deviations by fluid name [relative]
     * @param name  the fluid
     * @return its deviations
     * @throws FinstackException if the table has none for it
     */
    static double[] statedAccuracy(Map<String, double[]> table, String name) {
        double[] a = table.get(name);
        if (a == null) {
            throw new FinstackException(Msg.IMPOSSIBLE, "no stated accuracy for " + name);
        }
        return a;
    }

    /** @return a relative deviation as a percentage, as stated (e.g. 1e-4 gives 0.01) */
    static String pct(double v) {
        return java.math.BigDecimal.valueOf(v * 100).stripTrailingZeros().toPlainString();
    }

    /** A range bound as stated, without rounding. */
    private static String plain(double v) {
        return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}
