package org.finstack.units;

/**
 * The kind of a quantity, which fixes its SI unit and the units a person may write it in.
 * {@link Quantities#accepted(Dimension)} lists the accepted spellings of each.
 */
public enum Dimension {
    /** Length [m]. */
    LENGTH("m"),
    /** Area [m2]. */
    AREA("m2"),
    /** Volume [m3]. */
    VOLUME("m3"),
    /** Mass [kg]. */
    MASS("kg"),
    /** Thermodynamic (absolute) temperature [K]; °C, °F and °R are read with their offsets. */
    TEMPERATURE("K"),
    /** Temperature difference [K]; 1 °C = 1 K and 1 °F = 1 °R = 5/9 K, without offset. */
    TEMPERATURE_DIFFERENCE("K"),
    /** Velocity [m/s]. */
    VELOCITY("m/s"),
    /** Volume flow rate [m3/s]. */
    VOLUME_FLOW("m3/s"),
    /** Mass flow rate [kg/s]. */
    MASS_FLOW("kg/s"),
    /** Heat flow rate, e.g. a coil capacity [W]. */
    HEAT_FLOW("W"),
    /** Absolute pressure [Pa]; gauge units add the standard atmosphere. */
    PRESSURE("Pa"),
    /** Pressure difference, e.g. a pressure drop [Pa]; gauge units are refused. */
    PRESSURE_DIFFERENCE("Pa"),
    /** Heat transfer coefficient [W/(m2·K)]. */
    HEAT_TRANSFER_COEFFICIENT("W/(m2·K)"),
    /** Fouling resistance per unit area [m2·K/W]. */
    FOULING_RESISTANCE("m2·K/W"),
    /** Thermal conductivity [W/(m·K)]. */
    CONDUCTIVITY("W/(m·K)"),
    /** Fin pitch, the distance between fins [m]; also read from fin densities (fpi, fins/m). */
    FIN_PITCH("m"),
    /** Density [kg/m3]. */
    DENSITY("kg/m3"),
    /** Specific enthalpy [J/kg]. */
    SPECIFIC_ENTHALPY("J/kg"),
    /** Specific heat capacity [J/(kg·K)]. */
    SPECIFIC_HEAT("J/(kg·K)"),
    /** Dynamic viscosity [Pa·s]. */
    VISCOSITY("Pa·s"),
    /** Thermal resistance [K/W]. */
    THERMAL_RESISTANCE("K/W"),
    /** Overall conductance, UA [W/K]. */
    UA("W/K"),
    /** A pure number [-]; also read as a percentage. */
    DIMENSIONLESS("-"),
    /** Time [s]. */
    TIME("s"),
    /** Energy [J]. */
    ENERGY("J"),
    /** Power, e.g. a fan's shaft power [W]; the units of {@link #HEAT_FLOW} plus horsepower. */
    POWER("W");

    private final String siUnit;

    Dimension(String siUnit) {
        this.siUnit = siUnit;
    }

    /** @return the SI unit's canonical spelling; a bare number is read in this unit */
    public String siUnit() {
        return siUnit;
    }
}
