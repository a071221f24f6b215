package org.finstack.tubeside;

/**
 * Property sets for the tests: the rounded R134a saturation values of the package comment
 * (from memory; the tests check arithmetic against references evaluated with the same values,
 * so only plausibility matters). Also the constructor for the reference rows of the fluids CSV,
 * which give only the properties the methods there use.
 */
final class TubesideFixtures {

    private TubesideFixtures() {
    }

    /** R134a near 5 °C (evaporator); repeated in scripts/gen_tubeside_equations.py (EVAP). */
    static SaturatedProperties evaporating() {
        return new SaturatedProperties("R134a", 349.9e3, 4059.3e3, 0.102032, 1277.8, 17.13, 2.503e-4, 1.104e-5,
                0.0898, 0.01167, 1355, 903, 0.01078, 194.9e3);
    }

    /** R134a near 40 °C (condenser); repeated in scripts/gen_tubeside_equations.py (COND). */
    static SaturatedProperties condensing() {
        return new SaturatedProperties("R134a", 1016.6e3, 4059.3e3, 0.102032, 1146.7, 50.09, 1.614e-4, 1.253e-5,
                0.0748, 0.0152, 1498, 1145, 0.00608, 163.0e3);
    }

    /** The same fluid under another name (for fluid-dependent constants). */
    static SaturatedProperties renamed(SaturatedProperties p, String fluid) {
        return new SaturatedProperties(fluid, p.pressure(), p.criticalPressure(), p.molarMass(), p.liquidDensity(),
                p.vapourDensity(), p.liquidViscosity(), p.vapourViscosity(), p.liquidConductivity(),
                p.vapourConductivity(), p.liquidCp(), p.vapourCp(), p.surfaceTension(), p.latentHeat());
    }

    /** Properties from densities, viscosities and surface tension; the rest plausible fillers. */
    static SaturatedProperties of(double rhoL, double rhoV, double muL, double muV, double sigma) {
        return new SaturatedProperties("test", 1e5, 4e6, 0.1, rhoL, rhoV, muL, muV, 0.1, 0.01, 1500, 1000, sigma,
                2e5);
    }
}
