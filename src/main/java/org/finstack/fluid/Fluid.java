package org.finstack.fluid;

/**
 * A working fluid whose thermodynamic states can be computed. Implementations are immutable and
 * thread-safe; every method is a pure function of its arguments. States outside the fluid's valid
 * range throw {@link org.finstack.core.OutOfRangeException} with
 * {@link org.finstack.core.Msg#FLUID_OUT_OF_RANGE}; non-finite inputs throw
 * {@link org.finstack.core.InputException}.
 */
public interface Fluid {

    /** @return canonical name, e.g. {@code "R134a"} */
    String name();

    /** @return constants, ranges and sources */
    FluidInfo info();

    /**
     * @param temperature T [K], from the minimum temperature up to the critical temperature
     * @return saturated liquid and vapour at that temperature
     */
    SaturationState saturationAtTemperature(double temperature);

    /**
     * @param pressure p [Pa], from the triple-point pressure up to the critical pressure
     * @return saturated liquid and vapour at that pressure
     */
    SaturationState saturationAtPressure(double pressure);

    /**
     * A state fixed by two independent variables.
     *
     * @param pair which variables a and b are
     * @param a    first variable, in SI units ({@link InputPair})
     * @param b    second variable, in SI units
     * @return the state
     */
    FluidState at(InputPair pair, double a, double b);

    /**
     * @return the fluid's transport properties (viscosity, conductivity, surface tension)
     * @throws org.finstack.core.FinstackException if none are available for this fluid
     */
    default TransportProperties transport() {
        throw new org.finstack.core.FinstackException(org.finstack.core.Msg.IMPOSSIBLE,
                "no transport properties are available for " + name());
    }
}
