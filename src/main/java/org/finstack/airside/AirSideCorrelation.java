package org.finstack.airside;

import org.finstack.core.Citation;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * A published air-side correlation for one fin type: Colburn j and Fanning f as functions of the
 * surface and of the Reynolds number {@code ReDc = rho Vmax Dc / mu} (Vmax the velocity in the
 * minimum free-flow area, Dc the collar diameter).
 *
 * <p><b>Scatter.</b> {@link #scatterJ()} and {@link #scatterF()} are the share of the
 * correlating database (a number between 0 and 1) that the paper reports as predicted within
 * the band {@code ±}{@link #scatterBand()} (a fraction, e.g. 0.15 for ±15 %). For example
 * scatterJ = 0.886 with scatterBand = 0.15 means "88.6 % of the measured j values lie within
 * ±15 % of the correlation". They describe the fit to the authors' own data, inside the
 * validity range; they are not an uncertainty for a coil outside that database.
 */
public interface AirSideCorrelation {

    /** @return a stable identifier, e.g. {@code "wang-chi-chang-2000-plain"} */
    String id();

    /** @return the fin type the correlation was fitted to: "plain", "wavy" or "louvered" */
    String finType();

    /** @return the published source */
    Citation source();

    /** @return the published validity range */
    Validity validity();

    /** @return share of the database within ±{@link #scatterBand()} for j [-] */
    double scatterJ();

    /** @return share of the database within ±{@link #scatterBand()} for f [-] */
    double scatterF();

    /** @return the half-width of the band the scatter shares refer to, as a fraction [-] */
    double scatterBand();

    /**
     * Evaluates j and f. Inputs outside the published range add warnings and still return the
     * correlation's value; inputs where the formula cannot be evaluated throw an
     * {@link org.finstack.core.InputException}.
     *
     * @param s    the surface
     * @param reDc Reynolds number on the collar diameter and the velocity in the minimum
     *             free-flow area [-]
     * @param w    where range warnings go
     * @return j and f
     */
    JF evaluate(AirSideSurface s, double reDc, Warnings w);
}
