package org.finstack.fluid;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * R1234ze(E) (Thol &amp; Lemmon 2016) against the paper's Table 3 (p. 15, values for checking
 * computer implementations at given T and molar density).
 */
class TholLemmon2016R1234zeETest {

    private static final double M = 0.1140415928; // kg/mol, Thol & Lemmon 2016

    private final HelmholtzFluid fluid = (HelmholtzFluid) Fluids.byName("R1234ze(E)");

    /** Table 3: T [K], rho [mol/dm3], p [MPa], cv, cp [J/(mol K)], w [m/s]. */
    @ParameterizedTest(name = "T = {0} K, rho = {1} mol/dm3")
    @CsvSource({
        "200, 12.6, 2.161400, 94.9481, 139.161, 982.461",
        "350, 11.4, 95.04156, 112.495, 144.400, 902.540",
        "383, 4.29, 3.670105, 151.107, 17431.1, 79.9438",
        "360, 1, 2.039103, 113.342, 161.395, 122.236",
        "420, 8, 19.95447, 120.029, 169.513, 371.320",
    })
    void table3ComputerCheckValues(double t, double rhoMolar, String p, String cv, String cp, String w) {
        FluidState st = fluid.atTemperatureDensity(t, rhoMolar * 1e3 * M);
        String at = "Thol & Lemmon 2016 Table 3, T = " + t + " K, rho = " + rhoMolar + " mol/dm3";
        Published.value(p, 1e6, st.pressure(), at + ": p");
        Published.value(cv, 1 / M, st.cv(), at + ": cv");
        Published.value(cp, 1 / M, st.cp(), at + ": cp");
        Published.value(w, 1, st.speedOfSound(), at + ": w");
    }
}
