package org.finstack.study.uncertainty;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Limit;
import org.finstack.core.Msg;
import org.finstack.core.Validity;

/**
 * The standard deviation of a normal distribution that puts a given share of its values within
 * a symmetric band, from the coverage factor of the normal distribution (JCGM 100:2008, the
 * GUM, Annex G.1 and Table G.1):
 * <pre>
 *   share = P(|x - mu| &lt;= band) = 2 Phi(k) - 1,   k = Phi^-1((1 + share) / 2),   sigma = band / k
 * </pre>
 * with Phi the standard normal distribution function. A correlation whose paper reports that
 * a share of its database lies within {@code ±band} of it is given a multiplicative factor
 * {@code 1 + sigma z} (z standard normal) on j or f. That the deviations are normal and
 * centred on the correlation is an assumption: papers report the share, not the distribution.
 *
 * <p>Validity: share strictly between 0 and 1, band positive (mathematical range; no published
 * limits apply).
 *
 * <p>Worked example: 88.6 % of the data within ±15 % (Wang, Chi &amp; Chang 2000, plain fins, j)
 * gives k = 1.580467 and sigma = 0.0949087 (9.49 %).
 */
public final class NormalCoverage {

    /** The coverage factor of the normal distribution. */
    public static final Citation SOURCE = Citation.of("JCGM 100:2008",
            "JCGM 100:2008, Evaluation of measurement data - Guide to the expression of uncertainty in measurement"
                    + " (GUM 1995 with minor corrections), Joint Committee for Guides in Metrology, Annex G.1 and"
                    + " Table G.1 (coverage factor k for a normal distribution)");

    /** Mathematical range of the mapping. */
    public static final Validity VALIDITY = Validity.of(Limit.of("share", 0, 1), Limit.of("band", 0, 10));

    private static final NormalDistribution STANDARD = new NormalDistribution(null, 0, 1);

    private NormalCoverage() {
    }

    /**
     * @param share share of values within the band [-], strictly between 0 and 1
     * @return the coverage factor k = Phi^-1((1 + share) / 2) [-]
     */
    public static double coverageFactor(double share) {
        Check.finite("share", share);
        if (!(share > 0 && share < 1)) {
            throw new InputException("share", Msg.OUT_OF_BOUNDS, share, 0.0, 1.0);
        }
        return STANDARD.inverseCumulativeProbability((1 + share) / 2);
    }

    /**
     * @param share share of values within ±band [-], strictly between 0 and 1
     * @param band  half-width of the band [-] (e.g. 0.15 for ±15 %)
     * @return sigma = band / k [-], in the band's unit
     */
    public static double sigma(double share, double band) {
        Check.positive("band", band);
        return band / coverageFactor(share);
    }

    /**
     * The 10th and 90th percentiles of a normal distribution lie at mu -/+ this many standard
     * deviations: Phi^-1(0.9) = 1.2815516.
     *
     * @return k for a central 80 % interval [-]
     */
    public static double p90Factor() {
        return STANDARD.inverseCumulativeProbability(0.9);
    }
}
