package org.finstack.fluid;

import static org.finstack.testing.Reference.assertRelative;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * R134a (Tillner-Roth &amp; Baehr 1994) against published saturation tables, and the worked example
 * of {@link HelmholtzFluid}'s Javadoc.
 */
class TillnerRothBaehr1994R134aTest {

    private final Fluid r134a = Fluids.byName("R134a");

    /** The example in the Javadoc of {@link HelmholtzFluid}, repeated verbatim. */
    @Test
    void javadocExample() {
        SaturationState s = Fluids.byName("R134a").saturationAtTemperature(273.15);
        assertEquals(292_803, s.bubblePressure(), 1);
        assertEquals(1294.78, s.liquid().density(), 0.01);
        assertEquals(14.428, s.vapour().density(), 0.001);
        assertEquals(198_603, s.latentHeat(), 1);
    }

    /**
     * "Saturation Table R 134a" (IIR reference state; rows at -100, -90, -80 degC), a published
     * saturation table whose header states: temperature [degC], pressure [kPa], densities [kg/m3],
     * enthalpies [kJ/kg], entropies [kJ/(kg K)]. Values printed to five significant figures.
     */
    @ParameterizedTest(name = "{0} degC")
    @CsvSource({
        "-100, 0.5594, 1582.40, 0.039694, 75.362, 336.85, 0.4354, 1.9456",
        "-90, 1.5241, 1555.80, 0.10236, 87.226, 342.76, 0.50201, 1.8972",
        "-80, 3.6719, 1529.00, 0.23429, 99.161, 348.83, 0.56544, 1.858",
    })
    void saturationTableLowTemperatures(double tC, double pKpa, double rhoL, double rhoV, double hL, double hV,
            double sL, double sV) {
        SaturationState s = r134a.saturationAtTemperature(273.15 + tC);
        String at = "R134a saturation table at " + tC + " degC";
        assertRelative(pKpa * 1e3, s.bubblePressure(), 1e-4, at + ": p");
        assertRelative(rhoL, s.liquid().density(), 1e-4, at + ": rho'");
        assertRelative(rhoV, s.vapour().density(), 1e-4, at + ": rho''");
        assertRelative(hL * 1e3, s.liquid().enthalpy(), 1e-4, at + ": h'");
        assertRelative(hV * 1e3, s.vapour().enthalpy(), 1e-4, at + ": h''");
        assertRelative(sL * 1e3, s.liquid().entropy(), 2e-4, at + ": s'");
        assertRelative(sV * 1e3, s.vapour().entropy(), 2e-4, at + ": s''");
    }

    /**
     * ASHRAE Handbook - Fundamentals, chapter 30 (Thermophysical Properties of Refrigerants),
     * table "Refrigerant 134a (1,1,1,2-Tetrafluoroethane) Properties of Saturated Liquid and
     * Saturated Vapor", rows 0 degC and 40 degC; values from memory.
     */
    @ParameterizedTest(name = "{0} degC")
    @CsvSource({
        "0, 292.80, 1294.8, 14.428, 200.00, 398.60",
        "40, 1016.6, 1146.7, 50.085, 256.41, 419.43",
    })
    void ashraeSaturationTable(double tC, double pKpa, double rhoL, double rhoV, double hL, double hV) {
        SaturationState s = r134a.saturationAtTemperature(273.15 + tC);
        String at = "ASHRAE R134a table at " + tC + " degC (from memory)";
        assertRelative(pKpa * 1e3, s.bubblePressure(), 1e-4, at + ": p");
        assertRelative(rhoL, s.liquid().density(), 1e-4, at + ": rho'");
        assertRelative(rhoV, s.vapour().density(), 1e-4, at + ": rho''");
        assertRelative(hL * 1e3, s.liquid().enthalpy(), 1e-4, at + ": h'");
        assertRelative(hV * 1e3, s.vapour().enthalpy(), 1e-4, at + ": h''");
        assertRelative((hV - hL) * 1e3, s.latentHeat(), 2e-4, at + ": latent heat");
    }

    /**
     * Published value printed to n decimals: matched within one unit of its last decimal (the
     * paper's tables are rounded, in places truncated, in the last place).
     */
    private static void assertPrinted(String printed, double scale, double actual, String what) {
        int dot = printed.indexOf('.');
        int decimals = dot < 0 ? 0 : printed.length() - dot - 1;
        double expected = Double.parseDouble(printed) * scale;
        double tol = Math.pow(10, -decimals) * scale * 1.0001;
        assertEquals(expected, actual, tol, what + " (published " + printed + ")");
    }

    /**
     * Tillner-Roth &amp; Baehr 1994, Table 8 (p. 696): saturated states; T [K], p [MPa], then for
     * liquid and vapour rho [kg/m3], h [kJ/kg], s, cv, cp [kJ/(kg K)], w [m/s]. IIR reference.
     */
    @ParameterizedTest(name = "T = {0} K")
    @CsvSource({
        "169.85, 0.00039, 1591.1, 71.455, 0.4126, 0.7922, 1.1838, 1120.0, 0.02817, 334.94, 1.9639, 0.5030, 0.5853, 126.79",
        "200, 0.00631, 1510.5, 107.39, 0.6073, 0.8016, 1.2058, 967.61, 0.38977, 353.06, 1.8356, 0.5732, 0.6586, 135.98",
        "250, 0.11561, 1367.9, 169.57, 0.8841, 0.8515, 1.2865, 728.39, 5.9546, 384.60, 1.7443, 0.6962, 0.8044, 145.98",
        "300, 0.70282, 1199.7, 237.19, 1.1287, 0.9144, 1.4324, 497.89, 34.193, 413.27, 1.7156, 0.8426, 1.0438, 143.88",
        "350, 2.4611, 951.32, 316.50, 1.3674, 1.0037, 1.9614, 254.06, 140.99, 429.03, 1.6889, 1.0301, 1.8494, 120.33",
    })
    void paperTable8Saturation(double t, String p, String rhoL, String hL, String sL, String cvL, String cpL,
            String wL, String rhoV, String hV, String sV, String cvV, String cpV, String wV) {
        SaturationState s = r134a.saturationAtTemperature(t);
        String at = "Tillner-Roth & Baehr 1994 Table 8, T = " + t + " K";
        assertPrinted(p, 1e6, s.bubblePressure(), at + ": p");
        check(s.liquid(), at + ", liquid", rhoL, hL, sL, cvL, cpL, wL);
        check(s.vapour(), at + ", vapour", rhoV, hV, sV, cvV, cpV, wV);
    }

    /** Tillner-Roth &amp; Baehr 1994, Table 8 (p. 696), the row at p = 0.1 MPa (T = 246.79 K). */
    @Test
    void paperTable8SaturationAtOneBar() {
        FluidState l = r134a.at(InputPair.PQ, 1e5, 0);
        FluidState v = r134a.at(InputPair.PQ, 1e5, 1);
        String at = "Tillner-Roth & Baehr 1994 Table 8, p = 0.1 MPa";
        assertPrinted("246.79", 1, l.temperature(), at + ": T");
        check(l, at + ", liquid", "1377.5", "165.44", "0.8676", "0.8478", "1.2800", "743.31");
        check(v, at + ", vapour", "5.1932", "382.60", "1.7475", "0.6876", "0.7932", "145.63");
    }

    /**
     * Tillner-Roth &amp; Baehr 1994, Table 9 (p. 700): single-phase states; T [K], p [MPa], rho
     * [kg/m3], h [kJ/kg], s, cv, cp [kJ/(kg K)], w [m/s]. (The table's rows at 460 K lie above the
     * 455 K limit Finstack enforces and are left out.)
     */
    @ParameterizedTest(name = "T = {0} K, p = {1} MPa")
    @CsvSource({
        "205, 0.01, 1496.8, 113.44, 0.6372, 0.8055, 1.2120, 942.87",
        "325, 0.02, 0.75738, 449.09, 2.1106, 0.8000, 0.8828, 170.45",
        "170, 0.1, 1590.8, 71.678, 0.4136, 0.7922, 1.1837, 1119.6",
        "265, 0.2, 9.9171, 394.26, 1.7396, 0.7324, 0.8523, 147.61",
        "240, 0.5, 1398.8, 156.94, 0.8314, 0.8403, 1.2659, 777.64",
        "310, 1, 1160.4, 251.72, 1.1755, 0.9288, 1.4795, 452.15",
        "345, 2, 102.38, 434.73, 1.7164, 0.9701, 1.4224, 131.78",
        "270, 10, 1337.4, 198.54, 0.9675, 0.8750, 1.2947, 707.43",
        "185, 50, 1608.6, 112.12, 0.4657, 0.8100, 1.1623, 1208.3",
    })
    void paperTable9SinglePhase(double t, double pMpa, String rho, String h, String s, String cv, String cp,
            String w) {
        FluidState st = r134a.at(InputPair.TP, t, pMpa * 1e6);
        check(st, "Tillner-Roth & Baehr 1994 Table 9, T = " + t + " K, p = " + pMpa + " MPa", rho, h, s, cv, cp, w);
    }

    private static void check(FluidState st, String at, String rho, String h, String s, String cv, String cp,
            String w) {
        assertPrinted(rho, 1, st.density(), at + ": rho");
        assertPrinted(h, 1e3, st.enthalpy(), at + ": h");
        assertPrinted(s, 1e3, st.entropy(), at + ": s");
        assertPrinted(cv, 1e3, st.cv(), at + ": cv");
        assertPrinted(cp, 1e3, st.cp(), at + ": cp");
        assertPrinted(w, 1, st.speedOfSound(), at + ": w");
    }

    /** IIR reference state: h' = 200 kJ/kg, s' = 1 kJ/(kg K) at 0 degC (IIR convention, common practice). */
    @Test
    void iirReferenceState() {
        SaturationState s = r134a.saturationAtTemperature(273.15);
        assertEquals(200_000, s.liquid().enthalpy(), 1e-6);
        assertEquals(1_000, s.liquid().entropy(), 1e-9);
    }
}
