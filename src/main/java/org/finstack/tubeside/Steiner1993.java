package org.finstack.tubeside;

import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Steiner's (1993) horizontal-tube version of the {@link RouhaniAxelsson1970} drift-flux void
 * fraction, with C0 = 1 + 0.12 (1-x):
 * <pre>
 *   alpha = (x/rho_v) [ (1 + 0.12 (1-x)) (x/rho_v + (1-x)/rho_l)
 *                       + 1.18 (1-x) [g sigma (rho_l - rho_v)]^0.25 / (G rho_l^0.5) ]^-1
 * </pre>
 * Symbols and units as in {@link RouhaniAxelsson1970}. This is the form used for horizontal
 * evaporator tubes by Wojtan, Ursenbacher &amp; Thome (2005, Int. J. Heat Mass Transfer
 * 48:2955-2969).
 *
 * <p>Validity: the form holds for 0 &le; x &le; 1; no scatter figure is restated here.
 *
 * <p>Worked example: x = 0.4, rho_l = 800, rho_v = 2.5 kg/m3, sigma = 0.02 N/m, mass flow
 * 1 kg/s in D = 0.3 m give alpha = 0.895950.
 */
public final class Steiner1993 implements VoidFraction {

    /** Identifier in {@link VoidFractions}. */
    public static final String ID = "steiner-1993";

    /** The source. */
    public static final Citation SOURCE = Citation.of("Steiner 1993",
            "Steiner, D., 1993, \"Strömungssieden gesättigter Flüssigkeiten\", VDI-Wärmeatlas, 7th ed.,"
                    + " VDI-Verlag, Düsseldorf, chapter Hbb");

    /** Range of the form. */
    public static final Validity VALIDITY = Validity.assessed("of the equation form", Limit.of("x", 0, 1));

    /** The single instance. */
    public static final Steiner1993 INSTANCE = new Steiner1993();

    private final RouhaniAxelsson1970 form = new RouhaniAxelsson1970(0.12, ID, SOURCE, VALIDITY); // Steiner 1993

    private Steiner1993() {
    }

    @Override
    public String id() {
        return ID;
    }

    @Override
    public Citation source() {
        return SOURCE;
    }

    @Override
    public Validity validity() {
        return VALIDITY;
    }

    @Override
    public double voidFraction(SaturatedProperties p, TubeFlow f, Warnings w) {
        return form.voidFraction(p, f, w);
    }
}
