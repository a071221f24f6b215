package org.finstack.fluid;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * R717 (Gao et al. 2020, with its modified Gaussian terms) against the paper's Table 7 (p. 24,
 * values for checking computer implementations at given T and molar density). The paper's
 * enthalpy and entropy have another reference state than IIR: they are compared as differences
 * from the first row (T = 200 K, 50 mol/dm3).
 */
class Gao2020R717Test {

    private static final double M = 0.01703052; // kg/mol, Gao et al. 2020

    private final HelmholtzFluid nh3 = (HelmholtzFluid) Fluids.byName("R717");

    /** Table 7: T [K], rho [mol/dm3], p [MPa], cv, cp [J/(mol K)], w [m/s], h [kJ/mol], s [J/(mol K)]. */
    @ParameterizedTest(name = "T = {0} K, rho = {1} mol/dm3")
    @CsvSource({
        "200, 50, 555.5631, 56.15976, 74.22262, 2940.432, 9.541211, -11.61817",
        "250, 42, 108.7263, 50.25907, 72.04765, 2049.168, 5.715934, 14.26145",
        "320, 35, 27.63275, 46.95882, 78.92022, 1370.446, 9.831787, 36.06050",
        "380, 26, 8.174128, 47.82965, 125.1971, 668.5456, 15.45317, 53.81385",
        "405, 16.5, 11.25287, 77.13442, 4137.738, 247.2696, 20.13541, 65.30611",
        "406, 13.696, 11.45246, 103.0508, 52943.69, 225.4458, 21.30410, 68.15535",
        "275, 0.2, 0.4270652, 32.60471, 45.39676, 402.6253, 27.46383, 104.2956",
        "325, 0.95, 2.093496, 40.68660, 65.25439, 402.2104, 27.92681, 94.19375",
        "375, 3, 6.044096, 48.91890, 111.3738, 379.4300, 27.45404, 86.36105",
        "405, 10, 11.22040, 77.15007, 2051.793, 286.2398, 23.20689, 72.89756",
        "520, 1.5, 5.968880, 36.52118, 49.38647, 538.8044, 36.23166, 106.6103",
        "520, 13.696, 35.83377, 43.66588, 98.36082, 555.4454, 28.71997, 80.49762",
        "520, 20, 56.30750, 43.81573, 87.32996, 741.1842, 26.48937, 73.89537",
        "620, 5.5, 24.38934, 41.29819, 61.81978, 588.0372, 38.40927, 100.0682",
        "620, 14, 58.52754, 43.50218, 75.46188, 692.5867, 34.49909, 87.78122",
        "620, 45, 1355.431, 50.78124, 64.36735, 3201.084, 50.78325, 54.81426",
    })
    void table7ComputerCheckValues(double t, double rhoMolar, String p, String cv, String cp, String w, String h,
            String s) {
        FluidState first = nh3.atTemperatureDensity(200, 50e3 * M);
        double hOffset = first.enthalpy() - 9.541211e3 / M;
        double sOffset = first.entropy() - (-11.61817) / M;
        FluidState st = nh3.atTemperatureDensity(t, rhoMolar * 1e3 * M);
        String at = "Gao et al. 2020 Table 7, T = " + t + " K, rho = " + rhoMolar + " mol/dm3";
        Published.value(p, 1e6, st.pressure(), at + ": p");
        Published.value(cv, 1 / M, st.cv(), at + ": cv");
        Published.value(cp, 1 / M, st.cp(), at + ": cp");
        Published.value(w, 1, st.speedOfSound(), at + ": w");
        Published.value(h, 1e3 / M, hOffset, st.enthalpy(), at + ": h - h(200 K, 50 mol/dm3)");
        Published.value(s, 1 / M, sOffset, st.entropy(), at + ": s - s(200 K, 50 mol/dm3)");
    }
}
