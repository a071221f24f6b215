package org.finstack.fluid;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * R32 (Tillner-Roth &amp; Yokozeki 1997) against the paper's tables (IIR reference state):
 * Table 12 (saturation by temperature, p. 1293), Table 13 (saturation by pressure, p. 1295),
 * Table 14 (single phase, p. 1297) and Tables 15-17 (cp, cv, w; pp. 1319-1325).
 */
class TillnerRothYokozeki1997R32Test {

    private final Fluid r32 = Fluids.byName("R32");

    /** Table 12: t [degC], p [kPa], rho', rho'' [kg/m3], h', h'' [kJ/kg], s', s'', cp', cp'' [kJ/(kg K)]. */
    @ParameterizedTest(name = "t = {0} degC")
    @CsvSource({
        "-100, 3.81, 1339.0, 0.1385, 38.83, 468.31, 0.2711, 2.7515, 1.560, 0.703",
        "-50, 110.14, 1208.4, 3.2316, 117.22, 497.27, 0.6683, 2.3714, 1.589, 0.883",
        "0, 813.10, 1055.3, 22.091, 200.00, 515.30, 1.0000, 2.1543, 1.745, 1.251",
        "50, 3141.2, 839.26, 98.550, 297.49, 507.10, 1.3183, 1.9670, 2.439, 2.477",
        "74, 5304.6, 624.57, 240.12, 367.53, 466.41, 1.5179, 1.8027, 8.052, 12.094",
        "78, 5769.7, 484.61, 367.24, 400.38, 428.90, 1.6095, 1.6907, -, -",
    })
    void table12Saturation(double tC, String p, String rhoL, String rhoV, String hL, String hV, String sL, String sV,
            String cpL, String cpV) {
        SaturationState s = r32.saturationAtTemperature(273.15 + tC);
        String at = "Tillner-Roth & Yokozeki 1997 Table 12, t = " + tC + " degC";
        Published.value(p, 1e3, s.bubblePressure(), at + ": p");
        Published.state(s.liquid(), at + ", liquid", 0, 0, rhoL, hL, sL, "-", cpL, "-");
        Published.state(s.vapour(), at + ", vapour", 0, 0, rhoV, hV, sV, "-", cpV, "-");
    }

    /** Table 13: p [kPa], t [degC], then as Table 12. */
    @ParameterizedTest(name = "p = {0} kPa")
    @CsvSource({
        "100, -51.91, 1213.6, 2.9512, 114.18, 496.32, 0.6546, 2.3819, 1.587, 0.873",
        "5000, 71.18, 666.31, 207.51, 356.00, 476.27, 1.4859, 1.8352, 5.428, 7.607",
    })
    void table13SaturationByPressure(double pKpa, String tC, String rhoL, String rhoV, String hL, String hV, String sL,
            String sV, String cpL, String cpV) {
        FluidState l = r32.at(InputPair.PQ, pKpa * 1e3, 0);
        FluidState v = r32.at(InputPair.PQ, pKpa * 1e3, 1);
        String at = "Tillner-Roth & Yokozeki 1997 Table 13, p = " + pKpa + " kPa";
        Published.value(tC, 1, 273.15, l.temperature(), at + ": t");
        Published.state(l, at + ", liquid", 0, 0, rhoL, hL, sL, "-", cpL, "-");
        Published.state(v, at + ", vapour", 0, 0, rhoV, hV, sV, "-", cpV, "-");
    }

    /** Table 14: t [degC], p [kPa], rho [kg/m3], h [kJ/kg], s [kJ/(kg K)]. */
    @ParameterizedTest(name = "t = {0} degC, p = {1} kPa")
    @CsvSource({
        "-85, 10, 0.3354, 478.09, 2.6526", "-75, 20, 0.6401, 484.34, 2.5754", "160, 50, 0.7234, 687.70, 3.0905",
        "-55, 100, 1222.2, 109.29, 0.6324", "0, 200, 4.7455, 536.37, 2.4378", "-25, 300, 8.2165, 509.91, 2.2747",
        "105, 500, 8.4945, 627.61, 2.5771", "5, 1000, 1038.0, 208.80, 1.0313", "-85, 2000, 1303.6, 63.18, 0.3976",
        "160, 3000, 47.926, 662.45, 2.3927", "70, 5000, 689.76, 350.24, 1.4692", "45, 10000, 930.32, 280.50, 1.2414",
        "-85, 20000, 1323.9, 72.12, 0.3723", "160, 40000, 760.12, 475.86, 1.6700",
    })
    void table14SinglePhase(double tC, double pKpa, String rho, String h, String s) {
        FluidState st = r32.at(InputPair.TP, 273.15 + tC, pKpa * 1e3);
        Published.state(st, "Tillner-Roth & Yokozeki 1997 Table 14, t = " + tC + " degC, p = " + pKpa + " kPa", 0, 0,
                rho, h, s, "-", "-", "-");
    }

    /** Tables 15, 16 and 17: cp, cv [kJ/(kg K)] and w [m/s] at three states. */
    @Test
    void tables15to17HeatCapacitiesAndSpeedOfSound() {
        FluidState a = r32.at(InputPair.TP, 273.15 - 85, 20e3);
        Published.state(a, "Tillner-Roth & Yokozeki 1997 Tables 15-17, -85 degC, 20 kPa", 0, 0, "-", "-", "-",
                "0.970", "1.559", "1143.4");
        FluidState b = r32.at(InputPair.TP, 273.15 + 160, 6000e3);
        Published.state(b, "Tillner-Roth & Yokozeki 1997 Tables 15-17, 160 degC, 6000 kPa", 0, 0, "-", "-", "-",
                "0.976", "1.412", "254.16");
        FluidState c = r32.at(InputPair.TP, 273.15, 50000e3);
        Published.state(c, "Tillner-Roth & Yokozeki 1997 Tables 15-17, 0 degC, 50000 kPa", 0, 0, "-", "-", "-",
                "0.949", "1.518", "989.78");
    }
}
