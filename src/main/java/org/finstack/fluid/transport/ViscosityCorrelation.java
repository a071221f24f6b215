package org.finstack.fluid.transport;

/** A viscosity correlation of one fluid, as a function of temperature and density. */
interface ViscosityCorrelation {

    /**
     * @param temperature T [K]
     * @param density     rho [kg/m3]
     * @return dynamic viscosity [Pa s]
     */
    double viscosity(double temperature, double density);

    /**
     * @param temperature T [K]
     * @return the dilute-gas (zero-density) viscosity [Pa s]
     */
    double dilute(double temperature);
}
