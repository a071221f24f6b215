package org.finstack.fluid.eos;

import java.util.List;

/**
 * A multiparameter equation of state explicit in the reduced Helmholtz energy,
 * {@code a / (R T) = alpha0(delta, tau) + alphar(delta, tau)}, with the thermodynamic
 * properties of one state (given temperature and density) derived from it:
 * <pre>
 *   p / (rho R T)  = 1 + delta alphar_d
 *   h / (R T)      = 1 + tau (alpha0_t + alphar_t) + delta alphar_d
 *   s / R          = tau (alpha0_t + alphar_t) - alpha0 - alphar
 *   cv / R         = -tau^2 (alpha0_tt + alphar_tt)
 *   cp / R         = cv / R + X^2 / Y,  X = 1 + delta alphar_d - delta tau alphar_dt,
 *                                       Y = 1 + 2 delta alphar_d + delta^2 alphar_dd
 *   w^2 / (R T)    = Y cp / cv
 *   g / (R T)      = 1 + alpha0 + alphar + delta alphar_d
 * </pre>
 * with R the specific gas constant R_m / M. Immutable; every method is a pure function.
 */
public final class HelmholtzEos {

    private final double molarMass;
    private final double gasConstant;
    private final double reducingT;
    private final double reducingRho;
    private final IdealGasPart ideal;
    private final List<TermGroup> residual;

    /**
     * @param molarMass   M [kg/mol]
     * @param gasConstant molar gas constant used in the fit [J/(mol K)]
     * @param reducingT   T_r [K]
     * @param reducingRho molar reducing density [mol/m3]
     * @param ideal       ideal-gas part
     * @param residual    residual term groups
     */
    public HelmholtzEos(double molarMass, double gasConstant, double reducingT, double reducingRho,
            IdealGasPart ideal, List<TermGroup> residual) {
        this.molarMass = molarMass;
        this.gasConstant = gasConstant;
        this.reducingT = reducingT;
        this.reducingRho = reducingRho;
        this.ideal = ideal;
        this.residual = List.copyOf(residual);
    }

    /**
     * @param newIdeal another ideal-gas part (e.g. another reference state)
     * @return the same equation with that ideal-gas part
     */
    public HelmholtzEos withIdeal(IdealGasPart newIdeal) {
        return new HelmholtzEos(molarMass, gasConstant, reducingT, reducingRho, newIdeal, residual);
    }

    /** @return the ideal-gas part */
    public IdealGasPart ideal() {
        return ideal;
    }

    /** @return M [kg/mol] */
    public double molarMass() {
        return molarMass;
    }

    /** @return the specific gas constant R_m / M [J/(kg K)] */
    public double specificGasConstant() {
        return gasConstant / molarMass;
    }

    /** @return T_r [K] */
    public double reducingTemperature() {
        return reducingT;
    }

    /** @return the reducing density [kg/m3] */
    public double reducingDensity() {
        return reducingRho * molarMass;
    }

    /**
     * @param delta reduced density [-], above zero
     * @param tau   inverse reduced temperature [-], above zero
     * @return alphar and its derivatives
     */
    public Derivatives residual(double delta, double tau) {
        double[] acc = new double[6];
        for (TermGroup g : residual) {
            g.addTo(delta, tau, acc);
        }
        return Derivatives.of(acc);
    }

    /**
     * @param temperature T [K]
     * @param density     rho [kg/m3]
     * @return the pressure [Pa]
     */
    public double pressure(double temperature, double density) {
        double delta = density / reducingDensity();
        Derivatives r = residual(delta, reducingT / temperature);
        return density * specificGasConstant() * temperature * (1 + delta * r.ad());
    }

    /**
     * @param temperature T [K]
     * @param density     rho [kg/m3]
     * @return {p [Pa], (dp/drho)_T [Pa m3/kg]}
     */
    public double[] pressureAndSlope(double temperature, double density) {
        double delta = density / reducingDensity();
        Derivatives r = residual(delta, reducingT / temperature);
        double rt = specificGasConstant() * temperature;
        return new double[] {density * rt * (1 + delta * r.ad()),
            rt * (1 + 2 * delta * r.ad() + delta * delta * r.add())};
    }

    /**
     * All properties of one state.
     *
     * @param temperature T [K]
     * @param density     rho [kg/m3]
     * @return the properties
     */
    public Properties properties(double temperature, double density) {
        double rs = specificGasConstant();
        double delta = density / reducingDensity();
        double tau = reducingT / temperature;
        Derivatives r = residual(delta, tau);
        double[] i = ideal.tauPart(tau);
        double a0 = i[0] + Math.log(delta);
        double tauSum = tau * (i[1] + r.at());
        double x = 1 + delta * r.ad() - delta * tau * r.adt();
        double y = 1 + 2 * delta * r.ad() + delta * delta * r.add();
        double cv = -rs * tau * tau * (i[2] + r.att());
        double cp = cv + rs * x * x / y;
        double rt = rs * temperature;
        double p = density * rt * (1 + delta * r.ad());
        double h = rt * (1 + tauSum + delta * r.ad());
        double s = rs * (tauSum - a0 - r.a());
        double g = rt * (1 + a0 + r.a() + delta * r.ad());
        double w2 = rt * y * cp / cv;
        return new Properties(temperature, density, p, h, s, cp, cv, w2 > 0 ? Math.sqrt(w2) : 0, g,
                rt * y, density * rs * x);
    }

    /**
     * Properties of one state from the equation of state.
     *
     * @param temperature  T [K]
     * @param density      rho [kg/m3]
     * @param pressure     p [Pa]
     * @param enthalpy     h [J/kg]
     * @param entropy      s [J/(kg K)]
     * @param cp           isobaric heat capacity [J/(kg K)]
     * @param cv           isochoric heat capacity [J/(kg K)]
     * @param speedOfSound w [m/s] (0 where the state is mechanically unstable)
     * @param gibbs        g [J/kg]
     * @param dpdrho       (dp/drho) at constant T [Pa m3/kg]
     * @param dpdt         (dp/dT) at constant rho [Pa/K]
     */
    public record Properties(double temperature, double density, double pressure, double enthalpy,
            double entropy, double cp, double cv, double speedOfSound, double gibbs, double dpdrho,
            double dpdt) {
    }
}
