package org.finstack.tubeside;

import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * Saturation properties of a pure fluid (or an azeotrope) at one pressure, in SI units, as the
 * in-tube correlations need them. Supplied by the caller (the fluid layer); validated here.
 *
 * @param fluid              the fluid's name as commonly written, e.g. {@code "R134a"}; used by
 *                           methods with fluid-specific constants (may be empty)
 * @param pressure           saturation pressure [Pa]
 * @param criticalPressure   critical pressure [Pa], above the saturation pressure
 * @param molarMass          molar mass [kg/mol]
 * @param liquidDensity      saturated-liquid density [kg/m3]
 * @param vapourDensity      saturated-vapour density [kg/m3], below the liquid density
 * @param liquidViscosity    saturated-liquid dynamic viscosity [Pa s]
 * @param vapourViscosity    saturated-vapour dynamic viscosity [Pa s]
 * @param liquidConductivity saturated-liquid thermal conductivity [W/(m K)]
 * @param vapourConductivity saturated-vapour thermal conductivity [W/(m K)]
 * @param liquidCp           saturated-liquid isobaric specific heat [J/(kg K)]
 * @param vapourCp           saturated-vapour isobaric specific heat [J/(kg K)]
 * @param surfaceTension     surface tension [N/m]
 * @param latentHeat         latent heat of vaporisation [J/kg]
 */
public record SaturatedProperties(String fluid, double pressure, double criticalPressure, double molarMass,
        double liquidDensity, double vapourDensity, double liquidViscosity, double vapourViscosity,
        double liquidConductivity, double vapourConductivity, double liquidCp, double vapourCp,
        double surfaceTension, double latentHeat) {

    /** Checks every value: finite and positive, p below pc, vapour lighter than liquid. */
    public SaturatedProperties {
        fluid = fluid == null ? "" : fluid.strip();
        Check.positive("pressure", pressure);
        Check.positive("criticalPressure", criticalPressure);
        Check.positive("molarMass", molarMass);
        Check.positive("liquidDensity", liquidDensity);
        Check.positive("vapourDensity", vapourDensity);
        Check.positive("liquidViscosity", liquidViscosity);
        Check.positive("vapourViscosity", vapourViscosity);
        Check.positive("liquidConductivity", liquidConductivity);
        Check.positive("vapourConductivity", vapourConductivity);
        Check.positive("liquidCp", liquidCp);
        Check.positive("vapourCp", vapourCp);
        Check.positive("surfaceTension", surfaceTension);
        Check.positive("latentHeat", latentHeat);
        if (!(pressure < criticalPressure)) {
            throw new InputException("pressure", Msg.NOT_BELOW, pressure, criticalPressure);
        }
        if (!(vapourDensity < liquidDensity)) {
            throw new InputException("vapourDensity", Msg.NOT_BELOW, vapourDensity, liquidDensity);
        }
    }

    /** @return reduced pressure p / pc [-], between 0 and 1 */
    public double reducedPressure() {
        return pressure / criticalPressure;
    }

    /** @return liquid Prandtl number cp mu / k [-] */
    public double liquidPrandtl() {
        return liquidCp * liquidViscosity / liquidConductivity;
    }

    /** @return vapour Prandtl number cp mu / k [-] */
    public double vapourPrandtl() {
        return vapourCp * vapourViscosity / vapourConductivity;
    }
}
