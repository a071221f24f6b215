package org.finstack.fluid;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * R600a (Bücker &amp; Wagner 2006, isobutane) against the paper's Table 46 (saturation, p. 996) and
 * Table 47 (single phase, p. 1003). The paper's enthalpy and entropy have another reference state
 * than IIR: both are compared after the shift fixed by the row printed with most digits
 * (320 K, 0.5 MPa: h = 20.563 kJ/kg, s = -0.14464 kJ/(kg K)).
 */
class BueckerWagner2006R600aTest {

    private final Fluid ic4 = Fluids.byName("R600a");

    private double[] offsets() {
        FluidState a = ic4.at(InputPair.TP, 320, 0.5e6);
        return new double[] {a.enthalpy() - 20.563e3, a.entropy() - (-0.14464e3)};
    }

    /** Table 46: T [K], p [MPa], liquid then vapour rho, h, s, cv, cp, w. */
    @ParameterizedTest(name = "T = {0} K")
    @CsvSource({
        "150, 0.000024, 706.038, -650.69, -2.716, 1.251, 1.805, 1714.39, 0.00111, -198.52, 0.299, 0.894, 1.037, 157.76",
        "200, 0.003814, 657.706, -556.44, -2.175, 1.363, 1.968, 1389.12, 0.13378, -142.03, -0.103, 1.095, 1.241, 179.38",
        "300, 0.37000, 548.32, -338.17, -1.299, 1.690, 2.442, 810.25, 9.6096, -11.29, -0.209, 1.578, 1.810, 197.74",
        "400, 3.1856, 341.03, -36.27, -0.459, 2.250, 6.349, 184.38, 118.39, 81.59, -0.164, 2.354, 7.555, 128.90",
    })
    void table46Saturation(double t, String p, String rhoL, String hL, String sL, String cvL, String cpL, String wL,
            String rhoV, String hV, String sV, String cvV, String cpV, String wV) {
        double[] off = offsets();
        SaturationState s = ic4.saturationAtTemperature(t);
        String at = "Buecker & Wagner 2006 Table 46, T = " + t + " K";
        Published.value(p, 1e6, s.bubblePressure(), at + ": p");
        Published.state(s.liquid(), at + ", liquid", off[0], off[1], rhoL, hL, sL, cvL, cpL, wL);
        Published.state(s.vapour(), at + ", vapour", off[0], off[1], rhoV, hV, sV, cvV, cpV, wV);
    }

    /** Table 47: T [K], p [MPa], rho, h, s, cv, cp, w. */
    @ParameterizedTest(name = "T = {0} K, p = {1} MPa")
    @CsvSource({
        "115, 0.1, 739.18, -711.78, -3.1801, 1.1769, 1.6927, 1988.81",
        "320, 0.5, 12.322, 20.563, -0.14464, 1.6742, 1.9171, 201.39",
        "330, 1, 508.12, -261.48, -1.0589, 1.8167, 2.6701, 644.33",
        "575, 2, 25.769, 614.72, 1.0085, 2.7190, 2.9159, 280.39",
        "190, 5, 670.90, -570.53, -2.2856, 1.3443, 1.9257, 1477.48",
        "120, 10, 738.15, -691.86, -3.1247, 1.2021, 1.7037, 1969.38",
        "230, 30, 652.07, -464.54, -1.9602, 1.4740, 2.0224, 1398.87",
    })
    void table47SinglePhase(double t, double pMpa, String rho, String h, String s, String cv, String cp, String w) {
        double[] off = offsets();
        FluidState st = ic4.at(InputPair.TP, t, pMpa * 1e6);
        Published.state(st, "Buecker & Wagner 2006 Table 47, T = " + t + " K, p = " + pMpa + " MPa", off[0], off[1],
                rho, h, s, cv, cp, w);
    }
}
