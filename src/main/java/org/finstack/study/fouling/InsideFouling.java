package org.finstack.study.fouling;

import org.finstack.coil.CoilCase;
import org.finstack.coil.FoulingResistances;
import org.finstack.core.Check;
import org.finstack.core.Citation;

/**
 * The refrigerant-side deposit: an oil film (and whatever it binds) on the tube wall, entered as
 * a fouling resistance per unit inside area ({@link FoulingResistances#inside()}), in series with
 * the refrigerant film.
 *
 * <p>Typical values are the TEMA recommended fouling resistances for refrigerant service
 * ({@link #SOURCE}; values as reproduced in a public table of the TEMA fouling resistances, in
 * h ft2 F/Btu, converted with 1 h ft2 F/Btu = 0.17611 m2 K/W):
 * <ul>
 * <li>{@link #OIL_BEARING_VAPOUR}: "refrigerant vapors (oil bearing)", 0.002 h ft2 F/Btu =
 *     3.52e-4 m2 K/W, the value for an oil-logged evaporator or condenser;</li>
 * <li>{@link #REFRIGERANT_LIQUID}: "refrigerating liquids", 0.001 h ft2 F/Btu = 1.76e-4 m2 K/W
 *     (this row from memory of the same table).</li>
 * </ul>
 * A clean, well-separated system is near zero. These are design allowances, not measurements;
 * the study accepts any value from 0 to {@link #MAX} m2 K/W.
 *
 * <p>Worked example: {@code withOilFilm(case, OIL_BEARING_VAPOUR)} puts 3.5222e-4 m2 K/W inside.
 */
public final class InsideFouling {

    /** The standard the typical values come from. */
    public static final Citation SOURCE = Citation.of("TEMA",
            "Standards of the Tubular Exchanger Manufacturers Association, table of recommended fouling"
                    + " resistances (industrial fluids: refrigerant vapors, oil bearing; refrigerating liquids).");

    /** h ft2 F/Btu in m2 K/W (NIST SP 811, Appendix B: 1 Btu_IT/(h ft2 F) = 5.678263 W/(m2 K)). */
    private static final double US_RESISTANCE = 1 / 5.678263;

    /** Oil-bearing refrigerant vapour, TEMA 0.002 h ft2 F/Btu [m2 K/W]. */
    public static final double OIL_BEARING_VAPOUR = 0.002 * US_RESISTANCE;

    /** Refrigerating liquids, TEMA 0.001 h ft2 F/Btu [m2 K/W] (from memory). */
    public static final double REFRIGERANT_LIQUID = 0.001 * US_RESISTANCE;

    /** Largest inside resistance accepted [m2 K/W] (the case reader's limit). */
    public static final double MAX = 0.1;

    private InsideFouling() {
    }

    /**
     * @param c          a case
     * @param resistance oil-film resistance per unit inside area [m2 K/W], 0 to {@link #MAX}
     * @return the case with this inside resistance in place of its own
     */
    public static CoilCase withOilFilm(CoilCase c, double resistance) {
        Check.within("insideFouling", resistance, 0, MAX);
        FoulingResistances f = c.fouling();
        return c.withFouling(new FoulingResistances(f.airSide(), resistance, f.contact()));
    }
}
