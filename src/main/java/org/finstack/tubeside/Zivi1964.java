package org.finstack.tubeside;

import org.finstack.core.Citation;
import org.finstack.core.Limit;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Zivi's (1964) void fraction from minimum entropy production, the slip ratio being
 * S = (rho_l/rho_v)^(1/3):
 * <pre>
 *   alpha = [ 1 + ((1-x)/x) (rho_v/rho_l)^(2/3) ]^-1
 * </pre>
 * with x [-] the quality and rho [kg/m3] the saturated densities.
 *
 * <p>Validity: derived for annular flow without entrainment; the form holds for 0 &le; x &le; 1.
 * Zivi compared it with steam-water data (the {@code fluids} library's {@code Zivi} notes: based
 * on experimental data for boiling of water); that he gives no scatter figure is from memory.
 *
 * <p>Worked example: x = 0.4, rho_l = 800, rho_v = 2.5 kg/m3 give alpha = 0.968934 (the
 * {@code fluids} library's {@code Zivi(.4, 800, 2.5)} docstring gives 0.9689339909056356).
 */
public final class Zivi1964 implements VoidFraction {

    /** Identifier in {@link VoidFractions}. */
    public static final String ID = "zivi-1964";

    /** The paper. */
    public static final Citation SOURCE = Citation.of("Zivi 1964",
            "Zivi, S.M., 1964, \"Estimation of steady-state steam void-fraction by means of the principle of"
                    + " minimum entropy production\", J. Heat Transfer 86(2):247-251");

    /** Range of the form. */
    public static final Validity VALIDITY = Validity.assessed("of the equation form", Limit.of("x", 0, 1));

    /** The single instance. */
    public static final Zivi1964 INSTANCE = new Zivi1964();

    private Zivi1964() {
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
        double x = f.quality();
        if (x == 0) {
            return 0;
        }
        return 1 / (1 + (1 - x) / x * Math.pow(p.vapourDensity() / p.liquidDensity(), 2.0 / 3)); // Zivi 1964
    }
}
