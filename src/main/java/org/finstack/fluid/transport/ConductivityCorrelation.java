package org.finstack.fluid.transport;

/** A thermal-conductivity correlation of one fluid, as a function of temperature and density. */
interface ConductivityCorrelation {

    /**
     * @param temperature T [K]
     * @param density     rho [kg/m3]
     * @return thermal conductivity [W/(m K)], with the critical enhancement where the source has one
     */
    double conductivity(double temperature, double density);

    /**
     * @param temperature T [K]
     * @param density     rho [kg/m3]
     * @return the residual (background, density-dependent) part [W/(m K)], without the dilute-gas and
     *         critical-enhancement parts
     */
    double residual(double temperature, double density);
}
