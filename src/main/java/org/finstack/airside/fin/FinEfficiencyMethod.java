package org.finstack.airside.fin;

import org.finstack.core.Citation;
import org.finstack.core.Warnings;

/**
 * A published method for the dry efficiency of the plate fin around one tube: the heat the fin
 * gives off divided by what it would give off if all of it were at the root temperature.
 * Implementations are immutable and stateless.
 */
public interface FinEfficiencyMethod {

    /** @return a stable short identifier, used in case files and by {@link FinEfficiencyMethods#byId} */
    String id();

    /** @return the published source */
    Citation source();

    /**
     * @param cell the fin around one tube
     * @param h    air-side heat transfer coefficient on the fin [W/(m2 K)], &gt; 0
     * @param kFin thermal conductivity of the fin material [W/(m K)], &gt; 0
     * @param w    collects warnings for inputs outside the method's validity range
     * @return the dry fin efficiency eta_f, in (0, 1]
     * @throws org.finstack.core.InputException if h or kFin is not a positive finite number
     */
    double efficiency(PlateFinCell cell, double h, double kFin, Warnings w);

    /** The efficiency of one fin cell of one material as a function of the film coefficient alone. */
    @FunctionalInterface
    interface Bound {
        /**
         * @param h air-side heat transfer coefficient on the fin [W/(m2 K)], &gt; 0
         * @param w collects warnings for inputs outside the method's validity range
         * @return the dry fin efficiency eta_f, in (0, 1]
         */
        double efficiency(double h, Warnings w);
    }

    /**
     * The method for one cell and fin material, with what does not depend on h worked out once
     * (a rating asks for the efficiency of the same fin at many coefficients).
     *
     * @param cell the fin around one tube
     * @param kFin thermal conductivity of the fin material [W/(m K)], &gt; 0
     * @return the efficiency as a function of h, equal to {@link #efficiency}
     */
    default Bound bind(PlateFinCell cell, double kFin) {
        return (h, w) -> efficiency(cell, h, kFin, w);
    }
}
