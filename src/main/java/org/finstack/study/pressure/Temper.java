package org.finstack.study.pressure;

/**
 * The temper of a tube, where the allowable-stress tables distinguish it.
 *
 * <p>Coil tubes are taken as {@link #ANNEALED}: the return bends and headers of a plate-fin coil
 * are brazed, and brazing heat anneals copper next to the joint, so the copper tube handbook
 * requires the annealed rating for brazed drawn tube (Copper Development Association, The Copper
 * Tube Handbook, Table 3c footnote, read). Coil tube is also commonly bought soft (annealed) for
 * hairpin bending and mechanical expansion (common practice).
 */
public enum Temper {
    /** Annealed (soft, O temper); the rating to use for any brazed or welded tube. */
    ANNEALED,
    /** Drawn (hard, H temper); only for tube whose temper is not disturbed by brazing or welding. */
    DRAWN
}
