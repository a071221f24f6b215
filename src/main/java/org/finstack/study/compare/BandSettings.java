package org.finstack.study.compare;

import org.finstack.core.Check;
import org.finstack.study.uncertainty.UncertaintyBand;

/**
 * Whether and how a comparison rates each option's capacity band ({@link UncertaintyBand}: a
 * seeded Monte Carlo over the air-side correlation's published scatter). The same seed gives the
 * same band, so a comparison is reproducible.
 *
 * @param samples Monte Carlo samples per option, 0 for no band, else 3 to
 *                {@link UncertaintyBand#MAX_SAMPLES}
 * @param seed    the random seed
 */
public record BandSettings(int samples, long seed) {

    /** Seed used unless another is asked for (the {@code rate --uncertainty} default too). */
    public static final long DEFAULT_SEED = 1;

    /**
     * Samples per option unless others are asked for: a modest count that keeps a comparison quick;
     * its p10 and p90 move by a few tenths of a per cent with the seed (ask for more for a report).
     */
    public static final int DEFAULT_SAMPLES = 30;

    /** No band. */
    public static final BandSettings OFF = new BandSettings(0, DEFAULT_SEED);

    /** The default band: {@link #DEFAULT_SAMPLES} samples with {@link #DEFAULT_SEED}. */
    public static final BandSettings DEFAULT = new BandSettings(DEFAULT_SAMPLES, DEFAULT_SEED);

    /** Validates the count. */
    public BandSettings {
        if (samples != 0) {
            Check.within("samples", samples, 3, UncertaintyBand.MAX_SAMPLES);
        }
    }

    /** @return whether a band is to be rated */
    public boolean on() {
        return samples > 0;
    }
}
