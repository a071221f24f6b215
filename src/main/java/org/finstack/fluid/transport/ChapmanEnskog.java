package org.finstack.fluid.transport;

import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;

/**
 * Dilute-gas viscosity from kinetic theory (Chapman-Enskog, first approximation) with the
 * Lennard-Jones 12-6 collision integral of Neufeld, Janzen &amp; Aziz (1972):
 * <pre>
 *   eta0 = 26.692e-9 sqrt(M T) / (sigma^2 Omega22(T*))          [Pa s], M [g/mol], sigma [nm]
 *   Omega22(T*) = 1.16145 T*^-0.14874 + 0.52487 exp(-0.77320 T*) + 2.16178 exp(-2.43787 T*)
 *   T* = T / (epsilon/k)
 * </pre>
 * Parameters: T [K], M [kg/mol], sigma [m], epsilon/k [K]. Validity of the collision-integral fit:
 * 0.3 &lt;= T* &lt;= 100 (Neufeld et al. 1972); within it the fit reproduces the tabulated integral
 * within 0.1 %. Worked example: M = 0.102032 kg/mol, T = 300 K, sigma = 0.46893 nm, epsilon/k =
 * 299.363 K gives Omega22 = 1.59078 and eta0 = 1.33501e-5 Pa s (value repeated in
 * ChapmanEnskogTest).
 */
public final class ChapmanEnskog {

    /** The collision-integral fit. */
    public static final Citation SOURCE = Citation.of("Neufeld, Janzen & Aziz 1972",
            "Neufeld, P.D., Janzen, A.R., Aziz, R.A.: Empirical Equations to Calculate 16 of the Transport "
                    + "Collision Integrals Omega(l,s)* for the Lennard-Jones (12-6) Potential. J. Chem. Phys. 57(3), "
                    + "1100-1102 (1972)");

    /** Published range of the reduced temperature. */
    public static final Validity VALIDITY = Validity.of(Limit.of("T*", 0.3, 100));

    private ChapmanEnskog() {
    }

    /**
     * @param reducedTemperature T* = k T / epsilon [-]
     * @return the reduced collision integral Omega(2,2)* [-]
     */
    public static double collisionIntegral(double reducedTemperature) {
        double t = reducedTemperature;
        // Neufeld, Janzen & Aziz 1972, Omega(2,2)* coefficients
        return 1.16145 * Math.pow(t, -0.14874) + 0.52487 * Math.exp(-0.77320 * t) + 2.16178 * Math.exp(-2.43787 * t);
    }

    /**
     * @param molarMass     M [kg/mol]
     * @param temperature   T [K]
     * @param sigma         Lennard-Jones length [m]
     * @param epsilonOverK  Lennard-Jones energy over Boltzmann's constant [K]
     * @return dilute-gas viscosity [Pa s]
     */
    public static double viscosity(double molarMass, double temperature, double sigma, double epsilonOverK) {
        double sigmaNm = sigma * 1e9;
        // 26.692e-9: Chapman-Enskog constant 5/16 sqrt(k M_u / pi) / N_A in these units (Hirschfelder,
        // Curtiss & Bird 1954, eq. 8.2-18; 26.69 micropoise with sigma in angstrom), from memory
        return 26.692e-9 * Math.sqrt(molarMass * 1000 * temperature)
                / (sigmaNm * sigmaNm * collisionIntegral(temperature / epsilonOverK));
    }

    /**
     * Lennard-Jones parameters estimated from the critical point (Chung, Ajlan, Lee &amp; Starling
     * 1988, eq. 4): sigma = 0.809 Vc^(1/3) [angstrom, Vc in cm3/mol], epsilon/k = Tc / 1.2593.
     *
     * @param criticalTemperature Tc [K]
     * @param criticalMolarVolume Vc [m3/mol]
     * @return {sigma [m], epsilon/k [K]}
     */
    public static double[] chungParameters(double criticalTemperature, double criticalMolarVolume) {
        double vcCm3 = criticalMolarVolume * 1e6;
        // Chung et al. 1988 (Ind. Eng. Chem. Res. 27:671), eq. 4
        return new double[] {0.809 * Math.cbrt(vcCm3) * 1e-10, criticalTemperature / 1.2593};
    }

    /** The Chung et al. (1988) estimate of the Lennard-Jones parameters. */
    public static final Citation CHUNG = Citation.of("Chung, Ajlan, Lee & Starling 1988",
            "Chung, T.H., Ajlan, M., Lee, L.L., Starling, K.E.: Generalized Multiparameter Correlation for "
                    + "Nonpolar and Polar Fluid Transport Properties. Ind. Eng. Chem. Res. 27(4), 671-679 (1988)");
}
