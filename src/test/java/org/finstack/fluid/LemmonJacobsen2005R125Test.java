package org.finstack.fluid;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * R125 (Lemmon &amp; Jacobsen 2005, the terms with exp(-tau^m)) against the paper: Table 12
 * (p. 104, values for checking computer implementations at given T and molar density) and the
 * saturation table of Appendix B (Table 9, IIR reference state).
 */
class LemmonJacobsen2005R125Test {

    private static final double M = 0.1200214; // kg/mol, Lemmon & Jacobsen 2005

    private final HelmholtzFluid r125 = (HelmholtzFluid) Fluids.byName("R125");

    /** Table 12: T [K], rho [mol/dm3], p [MPa], cv, cp [J/(mol K)], w [m/s]. */
    @ParameterizedTest(name = "T = {0} K, rho = {1} mol/dm3")
    @CsvSource({
        "200, 14, 42.302520, 85.816305, 123.53641, 968.67194",
        "300, 10, 2.9023498, 99.919660, 164.16914, 345.91235",
        "300, 0.7, 1.3245058, 94.823171, 124.96009, 120.56007",
        "400, 5.0, 9.0495658, 114.41819, 198.11792, 151.53060",
        "339.2, 4.8, 3.6201215, 130.63650, 274863.02, 78.735928",
    })
    void table12ComputerCheckValues(double t, double rhoMolar, String p, String cv, String cp, String w) {
        FluidState st = r125.atTemperatureDensity(t, rhoMolar * 1e3 * M);
        String at = "Lemmon & Jacobsen 2005 Table 12, T = " + t + " K, rho = " + rhoMolar + " mol/dm3";
        Published.value(p, 1e6, st.pressure(), at + ": p");
        Published.value(cv, 1 / M, st.cv(), at + ": cv");
        Published.value(cp, 1 / M, st.cp(), at + ": cp");
        Published.value(w, 1, st.speedOfSound(), at + ": w");
    }

    /** Appendix B, Table 9: T [K], p [MPa], liquid then vapour rho, h, s, cv, cp, w. */
    @ParameterizedTest(name = "T = {0} K")
    @CsvSource({
        "172.52, 0.00291, 1690.7, 87.130, 0.49022, 0.6776, 1.035, 932.6, 0.24462, 277.39, 1.5931, 0.4984, 0.5689, 116.4",
        "273.15, 0.67052, 1319.8, 200.00, 1.000, 0.7948, 1.255, 448.0, 42.070, 333.16, 1.4875, 0.7240, 0.8797, 125.8",
        "339.15, 3.61607, 612.97, 314.86, 1.3602, 1.078, 818.2, 78.9, 534.59, 321.41, 1.3795, 1.093, 923.0, 79.2",
    })
    void table9Saturation(double t, String p, String rhoL, String hL, String sL, String cvL, String cpL, String wL,
            String rhoV, String hV, String sV, String cvV, String cpV, String wV) {
        SaturationState s = r125.saturationAtTemperature(t);
        String at = "Lemmon & Jacobsen 2005 Table 9, T = " + t + " K";
        Published.value(p, 1e6, s.bubblePressure(), at + ": p");
        Published.state(s.liquid(), at + ", liquid", 0, 0, rhoL, hL, sL, cvL, cpL, wL);
        Published.state(s.vapour(), at + ", vapour", 0, 0, rhoV, hV, sV, cvV, cpV, wV);
    }
}
