package org.finstack.core;

import java.util.Locale;

/** Small helpers for numbers in messages. */
public final class Numbers {

    private Numbers() {
    }

    /**
     * Formats a number briefly for a message: four significant figures, no exponent for
     * ordinary magnitudes.
     *
     * @param v value
     * @return text
     */
    public static String brief(double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            return Double.toString(v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e9) {
            return Long.toString((long) v);
        }
        double a = Math.abs(v);
        if (a >= 1e-3 && a < 1e7) {
            String s = String.format(Locale.ROOT, "%.4g", v);
            if (s.contains("e")) {
                return s;
            }
            if (s.contains(".")) {
                s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
            }
            return s;
        }
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
