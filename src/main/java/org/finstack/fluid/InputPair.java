package org.finstack.fluid;

/** The pairs of independent variables a state can be fixed by ({@link Fluid#at}). */
public enum InputPair {
    /** Temperature [K], pressure [Pa]: single-phase states only. */
    TP,
    /** Pressure [Pa], specific enthalpy [J/kg]. */
    PH,
    /** Pressure [Pa], vapour quality [-] (0 to 1). */
    PQ,
    /** Temperature [K], vapour quality [-] (0 to 1). */
    TQ
}
