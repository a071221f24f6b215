package org.finstack.report;

import java.util.Locale;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/** Number formatting shared by the summary's writers. */
final class Format {

    private Format() {
    }

    static String q(double si, Dimension d, UnitSystem u) {
        return Quantities.format(si, d, u);
    }

    static String ratio(double r) {
        return String.format(Locale.ROOT, "%.3f", r);
    }
}
