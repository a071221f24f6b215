package org.finstack.airside;

import org.finstack.core.Check;
import org.finstack.core.Citation;

/**
 * Heat-transfer coefficient from the Colburn j factor, {@code h = j G cp / Pr^(2/3)}, the
 * definition {@code j = St Pr^(2/3)} with {@code St = h / (G cp)}.
 *
 * <p>Worked example: j = 0.01, G = 5 kg/(m2 s), cp = 1007 J/(kg K), Pr = 0.707 give
 * h = 63.44 W/(m2 K).
 */
public final class ColburnFactor {

    /** The definition of the j factor. */
    public static final Citation SOURCE = Citation.of("Colburn 1933",
            "Colburn, A.P., 1933, \"A method of correlating forced convection heat transfer data and a"
                    + " comparison with fluid friction\", Trans. AIChE 29:174-210");

    private ColburnFactor() {
    }

    /**
     * @param j  Colburn factor [-]
     * @param g  mass velocity in the minimum free-flow area [kg/(m2 s)]
     * @param cp isobaric heat capacity of the air [J/(kg K)]
     * @param pr Prandtl number [-]
     * @return heat-transfer coefficient h [W/(m2 K)]
     */
    public static double heatTransferCoefficient(double j, double g, double cp, double pr) {
        Check.positive("j", j);
        Check.nonNegative("massVelocity", g);
        Check.positive("cp", cp);
        Check.positive("prandtl", pr);
        return j * g * cp / Math.pow(pr, 2.0 / 3.0);
    }
}
