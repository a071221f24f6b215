package org.finstack.coil;

import java.util.List;
import org.finstack.core.Citation;
import org.finstack.geometry.DerivedGeometry;

/**
 * The result of rating a coil. All values SI; temperatures in kelvin. Capacity is the heat
 * moved, as a positive number; the duty says its direction (a condenser heats the air, an
 * evaporator cools it).
 *
 * @param model                model that produced the rating
 * @param duty                 condenser or evaporator
 * @param capacity             heat moved between air and refrigerant [W]
 * @param airInletTemperature  [K]
 * @param airOutletTemperature [K]
 * @param airMassFlow          [kg/s]
 * @param airVolumeFlow        at the inlet state [m3/s]
 * @param faceVelocity         at the inlet state [m/s]
 * @param airPressureDrop      air-side pressure drop across the coil [Pa]
 * @param geometry             the coil's derived geometry
 * @param maxVelocity          air velocity in the minimum free-flow area [m/s]
 * @param reynoldsDc           Reynolds number on the collar diameter and maximum velocity [-]
 * @param colburnJ             Colburn j factor [-]
 * @param frictionF            Fanning friction factor of the core [-]
 * @param airCoefficient       air-side heat-transfer coefficient [W/(m2 K)]
 * @param finEfficiency        dry fin efficiency [-]
 * @param surfaceEffectiveness overall surface effectiveness eta_o [-]
 * @param resistances          the series resistances [K/W]
 * @param ntu                  number of transfer units on the air side [-]
 * @param effectiveness        exchanger effectiveness [-]
 * @param airProperties        air properties used (at the mean air temperature)
 * @param warnings             validity and plausibility warnings
 * @param methods              the published methods used
 */
public record Rating(String model, Duty duty, double capacity, double airInletTemperature,
        double airOutletTemperature, double airMassFlow, double airVolumeFlow, double faceVelocity,
        double airPressureDrop, DerivedGeometry geometry, double maxVelocity, double reynoldsDc, double colburnJ,
        double frictionF, double airCoefficient, double finEfficiency, double surfaceEffectiveness,
        Resistances resistances, double ntu, double effectiveness, AirProperties airProperties,
        List<String> warnings, List<Citation> methods) {

    /** Copies the lists. */
    public Rating {
        warnings = List.copyOf(warnings);
        methods = List.copyOf(methods);
    }

    /** @return overall conductance UA = 1 / sum of resistances [W/K] */
    public double ua() {
        return 1 / resistances.total();
    }

    /**
     * Air properties at the state a rating used them.
     *
     * @param temperature  [K]
     * @param density      [kg/m3]
     * @param cp           [J/(kg K)]
     * @param viscosity    [Pa s]
     * @param conductivity [W/(m K)]
     * @param prandtl      [-]
     */
    public record AirProperties(double temperature, double density, double cp, double viscosity,
            double conductivity, double prandtl) {
    }
}
