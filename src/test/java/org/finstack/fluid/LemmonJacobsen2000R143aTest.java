package org.finstack.fluid;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * R143a (Lemmon &amp; Jacobsen 2000) against the paper's tables (IIR reference state): saturation
 * (p. 541) and single phase (p. 544).
 */
class LemmonJacobsen2000R143aTest {

    private final Fluid r143a = Fluids.byName("R143a");

    /** Saturation table: t [degC], p [MPa], liquid then vapour rho, h, s, cv, cp, w. */
    @ParameterizedTest(name = "t = {0} degC")
    @CsvSource({
        "-50, 0.08874, 1173.9, 130.05, 0.71968, 0.8608, 1.318, 763.9, 4.2098, 358.58, 1.7438, 0.7046, 0.8331, 154.2",
        "0, 0.61967, 1024.3, 200.00, 1.0000, 0.9408, 1.495, 524.3, 27.306, 387.81, 1.6876, 0.8756, 1.109, 153.1",
        "50, 2.30735, 802.97, 283.90, 1.2748, 1.051, 2.118, 262.7, 120.31, 402.43, 1.6416, 1.093, 2.070, 127.9",
        "70, 3.55268, 600.85, 333.20, 1.4172, 1.198, 7.720, 122.4, 270.10, 385.42, 1.5694, 1.272, 11.50, 104.2",
    })
    void saturationTable(double tC, String p, String rhoL, String hL, String sL, String cvL, String cpL, String wL,
            String rhoV, String hV, String sV, String cvV, String cpV, String wV) {
        SaturationState s = r143a.saturationAtTemperature(273.15 + tC);
        String at = "Lemmon & Jacobsen 2000 saturation table, t = " + tC + " degC";
        Published.value(p, 1e6, s.bubblePressure(), at + ": p");
        Published.state(s.liquid(), at + ", liquid", 0, 0, rhoL, hL, sL, cvL, cpL, wL);
        Published.state(s.vapour(), at + ", vapour", 0, 0, rhoV, hV, sV, cvV, cpV, wV);
    }

    /** Single-phase table: t [degC], p [MPa], rho, h, s, cv, cp, w. */
    @ParameterizedTest(name = "t = {0} degC, p = {1} MPa")
    @CsvSource({
        "-100, 0.1, 1302.0, 66.918, 0.39984, 0.8116, 1.220, 1002.1",
        "-30, 0.2, 8.9809, 371.54, 1.7237, 0.7650, 0.9139, 156.6",
        "300, 0.5, 8.8753, 746.36, 2.5782, 1.274, 1.378, 246.1",
        "10, 1, 990.23, 215.21, 1.0533, 0.9584, 1.548, 477.5",
        "50, 2, 91.768, 412.95, 1.6833, 1.030, 1.565, 140.6",
        "-100, 3, 1306.3, 68.426, 0.39571, 0.8137, 1.216, 1013.2",
        "300, 5, 93.689, 728.89, 2.3254, 1.289, 1.452, 238.9",
        "0, 10, 1068.3, 201.73, 0.97356, 0.9401, 1.411, 620.1",
        "-100, 20, 1329.3, 77.432, 0.37323, 0.8229, 1.199, 1074.5",
        "40, 50, 1098.8, 272.04, 1.0876, 1.013, 1.373, 761.6",
        "300, 100, 890.50, 681.83, 1.9149, 1.368, 1.595, 671.2",
    })
    void singlePhaseTable(double tC, double pMpa, String rho, String h, String s, String cv, String cp, String w) {
        FluidState st = r143a.at(InputPair.TP, 273.15 + tC, pMpa * 1e6);
        Published.state(st, "Lemmon & Jacobsen 2000 single-phase table, t = " + tC + " degC, p = " + pMpa + " MPa", 0,
                0, rho, h, s, cv, cp, w);
    }
}
