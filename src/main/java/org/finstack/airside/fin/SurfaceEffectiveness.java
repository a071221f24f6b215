package org.finstack.airside.fin;

import org.finstack.core.Check;
import org.finstack.core.Citation;

/**
 * Surface effectiveness (overall surface efficiency) of a finned surface: the heat it gives off
 * over what it would give off if fins and bare tube were all at the root temperature,
 * <pre>
 *   eta_o = 1 - (Af / A) (1 - eta_f)
 * </pre>
 * with Af the fin area [m2], A the total (fin plus bare tube) area [m2] and eta_f the fin
 * efficiency [-]. Exact given eta_f (a definition, no range of validity).
 *
 * <p>Example: eta_f = 0.8, Af = 0.9 m2, A = 1.0 m2: eta_o = 0.82.
 */
public final class SurfaceEffectiveness {

    /** Where the relation is stated. */
    public static final Citation SOURCE = Citation.of("Incropera et al. 2007",
            "F. P. Incropera, D. P. DeWitt, T. L. Bergman, A. S. Lavine, Fundamentals of Heat and "
                    + "Mass Transfer, 6th ed., Wiley, 2007, Section 3.6.5 (overall surface efficiency)");

    private SurfaceEffectiveness() {
    }

    /**
     * @param etaFin    fin efficiency eta_f [-], in (0, 1]
     * @param finArea   fin area Af [m2], from 0 to totalArea
     * @param totalArea total heat-transfer area A [m2], &gt; 0
     * @return eta_o in (0, 1]
     * @throws org.finstack.core.InputException naming {@code etaFin}, {@code finArea} or
     *                                          {@code totalArea}
     */
    public static double of(double etaFin, double finArea, double totalArea) {
        Check.within("etaFin", etaFin, 0, 1);
        Check.positive("etaFin", etaFin);
        Check.positive("totalArea", totalArea);
        Check.within("finArea", finArea, 0, totalArea);
        return 1 - finArea / totalArea * (1 - etaFin);
    }
}
