package org.finstack.fluid;

import java.util.List;
import java.util.Objects;
import org.finstack.core.Citation;

/**
 * What is known about a fluid apart from its states. Immutable.
 *
 * @param name                 canonical trade name, e.g. {@code "R134a"}
 * @param aliases              other accepted names, e.g. {@code "HFC-134a"}
 * @param chemicalName         chemical name
 * @param safetyClass          ANSI/ASHRAE Standard 34 / ISO 817 safety class, e.g. {@code "A1"}
 * @param gwp100               global warming potential, 100-year horizon [-]
 * @param gwpBasis             which assessment the GWP comes from (IPCC AR4, as in Regulation
 *                             (EU) No 517/2014)
 * @param criticalTemperature  Tc [K]: the critical point as given with the equation's data (for
 *                             R134a, R1234ze(E) and R717 the equation's own critical point, which
 *                             differs from the paper's stated values by less than 0.03 K)
 * @param criticalPressure     pc [Pa]
 * @param criticalDensity      rho_c [kg/m3]
 * @param molarMass            M [kg/mol]
 * @param tripleTemperature    triple-point temperature [K] (for a blend, which has no triple point:
 *                             the lowest temperature of the equation's range)
 * @param triplePressure       vapour pressure at the triple point, from the equation of state [Pa]
 *                             (for a blend: the bubble-point pressure at the lowest temperature)
 * @param minTemperature       lowest valid temperature [K]
 * @param maxTemperature       highest valid temperature [K]
 * @param maxPressure          highest valid pressure [Pa]
 * @param equationOfState      the equation of state's source
 * @param referenceState       how enthalpy and entropy are anchored
 * @param composition          for a blend, its components with their mass fractions (summing to
 *                             1); empty for a pure fluid
 */
public record FluidInfo(String name, List<String> aliases, String chemicalName, String safetyClass,
        double gwp100, String gwpBasis, double criticalTemperature, double criticalPressure,
        double criticalDensity, double molarMass, double tripleTemperature, double triplePressure,
        double minTemperature, double maxTemperature, double maxPressure, Citation equationOfState,
        String referenceState, List<Component> composition) {

    /** Copies the lists and checks the references. */
    public FluidInfo {
        Objects.requireNonNull(name, "name");
        aliases = List.copyOf(aliases);
        Objects.requireNonNull(equationOfState, "equationOfState");
        composition = List.copyOf(composition);
    }

    /**
     * A pure fluid's information (no composition).
     *
     * @param name                canonical trade name
     * @param aliases             other accepted names
     * @param chemicalName        chemical name
     * @param safetyClass         safety class
     * @param gwp100              GWP, 100-year horizon [-]
     * @param gwpBasis            which assessment the GWP comes from
     * @param criticalTemperature Tc [K]
     * @param criticalPressure    pc [Pa]
     * @param criticalDensity     rho_c [kg/m3]
     * @param molarMass           M [kg/mol]
     * @param tripleTemperature   triple-point temperature [K]
     * @param triplePressure      vapour pressure at the triple point [Pa]
     * @param minTemperature      lowest valid temperature [K]
     * @param maxTemperature      highest valid temperature [K]
     * @param maxPressure         highest valid pressure [Pa]
     * @param equationOfState     the equation of state's source
     * @param referenceState      how enthalpy and entropy are anchored
     */
    public FluidInfo(String name, List<String> aliases, String chemicalName, String safetyClass, double gwp100,
            String gwpBasis, double criticalTemperature, double criticalPressure, double criticalDensity,
            double molarMass, double tripleTemperature, double triplePressure, double minTemperature,
            double maxTemperature, double maxPressure, Citation equationOfState, String referenceState) {
        this(name, aliases, chemicalName, safetyClass, gwp100, gwpBasis, criticalTemperature, criticalPressure,
                criticalDensity, molarMass, tripleTemperature, triplePressure, minTemperature, maxTemperature,
                maxPressure, equationOfState, referenceState, List.of());
    }

    /** @return whether the fluid is a blend (has a composition) */
    public boolean isBlend() {
        return !composition.isEmpty();
    }

    /**
     * One component of a blend.
     *
     * @param name         the component's canonical name, e.g. {@code "R32"}
     * @param massFraction its mass fraction [-], above 0 up to 1
     */
    public record Component(String name, double massFraction) {

        /** Checks the name and the fraction. */
        public Component {
            Objects.requireNonNull(name, "name");
            if (!(massFraction > 0 && massFraction <= 1)) {
                throw new IllegalArgumentException("mass fraction of " + name + " must lie in (0, 1]: "
                        + massFraction);
            }
        }
    }

}
