package org.finstack.fluid;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * Comparison with values printed in published tables: a value printed with n decimals is matched
 * within one unit of its last decimal (tables are rounded, in places truncated, in the last
 * place), or within 1e-6 of its value where the table prints more digits than that (computer
 * check tables with 8 significant figures: at that level constants rounded differently in the
 * paper and in the data file show, e.g. R125 cv deviates by 5e-7). A printed "-" means the table
 * gives no value there.
 */
final class Published {

    private Published() {
    }

    /**
     * @param printed the table's text, e.g. {@code "1496.8"}
     * @param scale   factor from the table's unit to SI (e.g. 1e3 for kJ/kg)
     * @param offset  added to the table value after scaling (reference-state shift), SI
     * @param actual  computed value, SI
     * @param what    what is compared, with the table's name
     */
    static void value(String printed, double scale, double offset, double actual, String what) {
        String p = printed.strip();
        if (p.equals("-")) {
            return;
        }
        int dot = p.indexOf('.');
        int decimals = dot < 0 ? 0 : p.length() - dot - 1;
        double expected = Double.parseDouble(p) * scale + offset;
        double tol = Math.max(Math.pow(10, -decimals) * Math.abs(scale) * 1.0001, 1e-6 * Math.abs(expected - offset));
        assertEquals(expected, actual, tol, what + " (published " + p + ")");
    }

    /** Same, without an offset. */
    static void value(String printed, double scale, double actual, String what) {
        value(printed, scale, 0, actual, what);
    }

    /**
     * One state against a table row in kg-based units: rho [kg/m3], h [kJ/kg], s, cv, cp
     * [kJ/(kg K)], w [m/s]; h and s shifted by the given offsets [J/kg, J/(kg K)] to the IIR
     * reference state.
     */
    static void state(FluidState st, String at, double hOffset, double sOffset, String rho, String h, String s,
            String cv, String cp, String w) {
        value(rho, 1, st.density(), at + ": rho");
        value(h, 1e3, hOffset, st.enthalpy(), at + ": h");
        value(s, 1e3, sOffset, st.entropy(), at + ": s");
        value(cv, 1e3, st.cv(), at + ": cv");
        value(cp, 1e3, st.cp(), at + ": cp");
        value(w, 1, st.speedOfSound(), at + ": w");
    }
}
