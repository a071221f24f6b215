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
 * @param moisture             sensible/latent split and leaving humidity
 * @param refrigerant          the refrigerant side's result, or {@code null} for the isothermal model
 * @param zones                the zones of the zone model (empty otherwise)
 * @param tubes                the per-tube table of the tube-by-tube model (empty otherwise)
 */
public record Rating(String model, Duty duty, double capacity, double airInletTemperature,
        double airOutletTemperature, double airMassFlow, double airVolumeFlow, double faceVelocity,
        double airPressureDrop, DerivedGeometry geometry, double maxVelocity, double reynoldsDc, double colburnJ,
        double frictionF, double airCoefficient, double finEfficiency, double surfaceEffectiveness,
        Resistances resistances, double ntu, double effectiveness, AirProperties airProperties,
        List<String> warnings, List<Citation> methods, Moisture moisture, RefrigerantResult refrigerant,
        List<ZoneResult> zones, List<TubeResult> tubes) {

    /** Copies the lists. */
    public Rating {
        warnings = List.copyOf(warnings);
        methods = List.copyOf(methods);
        zones = List.copyOf(zones);
        tubes = List.copyOf(tubes);
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

    /**
     * The moist-air side of a rating.
     *
     * @param sensibleCapacity        sensible heat [W]
     * @param latentCapacity          latent heat (condensing or freezing water) [W]
     * @param condensate              water removed from the air [kg/s]
     * @param frost                   whether the water freezes on the fins (surface below 0 C)
     * @param airOutletHumidityRatio  leaving humidity ratio [kg/kg dry air]
     * @param airOutletRelativeHumidity leaving relative humidity [0..1]
     */
    public record Moisture(double sensibleCapacity, double latentCapacity, double condensate, boolean frost,
            double airOutletHumidityRatio, double airOutletRelativeHumidity) {

        /** @return sensible over total heat [-] (1 for a dry coil) */
        public double sensibleHeatRatio() {
            double total = sensibleCapacity + latentCapacity;
            return total == 0 ? 1 : sensibleCapacity / total;
        }
    }

    /**
     * The refrigerant side of a full rating.
     *
     * @param fluid                     refrigerant name
     * @param massFlow                  [kg/s]
     * @param inletPressure             [Pa]
     * @param outletPressure            [Pa]
     * @param inletTemperature          [K]
     * @param outletTemperature         [K]
     * @param inletEnthalpy             [J/kg]
     * @param outletEnthalpy            [J/kg]
     * @param outletQuality             vapour quality at the outlet, or -1 when single-phase
     * @param outletSuperheat           evaporator outlet superheat [K] (0 if not superheated)
     * @param outletSubcooling          condenser outlet subcooling [K] (0 if not subcooled)
     * @param saturationTemperatureDrop fall of the dew-point temperature from inlet to outlet [K]
     * @param charge                    refrigerant held in the coil's tubes [kg]
     * @param energyBalanceError        (air-side duty - refrigerant-side duty) / duty [-]
     * @param circuits                  each circuit's outlet state
     * @param inletDewTemperature       dew-point temperature at the inlet pressure [K]
     * @param outletDewTemperature      dew-point temperature at the outlet pressure [K]
     */
    public record RefrigerantResult(String fluid, double massFlow, double inletPressure, double outletPressure,
            double inletTemperature, double outletTemperature, double inletEnthalpy, double outletEnthalpy,
            double outletQuality, double outletSuperheat, double outletSubcooling, double saturationTemperatureDrop,
            double charge, double energyBalanceError, List<CircuitResult> circuits, double inletDewTemperature,
            double outletDewTemperature) {

        /** Copies the list. */
        public RefrigerantResult {
            circuits = List.copyOf(circuits);
        }

        /** @return pressure drop through the coil [Pa] */
        public double pressureDrop() {
            return inletPressure - outletPressure;
        }
    }

    /**
     * One circuit's share.
     *
     * @param index             circuit number from 0
     * @param massFlow          [kg/s]
     * @param duty              heat to the refrigerant [W] (negative in a condenser)
     * @param outletTemperature [K]
     * @param outletSuperheat   [K] (evaporator; 0 if not superheated)
     * @param outletSubcooling  [K] (condenser; 0 if not subcooled)
     * @param outletQuality     vapour quality, or -1 when single-phase
     * @param pressureDrop      [Pa]
     */
    public record CircuitResult(int index, double massFlow, double duty, double outletTemperature,
            double outletSuperheat, double outletSubcooling, double outletQuality, double pressureDrop) {
    }

    /**
     * One zone of the zone model.
     *
     * @param name              {@code superheat}, {@code two-phase}, {@code desuperheat}, {@code condensing}, {@code subcool}
     * @param areaFraction      share of the coil's surface [-]
     * @param duty              heat moved in the zone [W] (positive)
     * @param insideCoefficient refrigerant film coefficient used [W/(m2 K)]
     * @param wet               whether the zone's surface is wet
     */
    public record ZoneResult(String name, double areaFraction, double duty, double insideCoefficient, boolean wet) {
    }

    /**
     * One tube of the tube-by-tube model.
     *
     * @param circuit                  circuit number from 0
     * @param row                      row from 0 (air entering side)
     * @param position                 place in the row from 0 (top)
     * @param refrigerantInTemperature [K]
     * @param refrigerantOutTemperature [K]
     * @param qualityIn                vapour quality entering, or -1 when single-phase
     * @param qualityOut               vapour quality leaving, or -1 when single-phase
     * @param airInTemperature         mean entering air temperature [K]
     * @param airOutTemperature        mean leaving air temperature [K]
     * @param duty                     heat moved [W] (positive)
     */
    public record TubeResult(int circuit, int row, int position, double refrigerantInTemperature,
            double refrigerantOutTemperature, double qualityIn, double qualityOut, double airInTemperature,
            double airOutTemperature, double duty) {
    }
}
