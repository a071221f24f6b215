package org.finstack.cli;

import org.finstack.core.InputException;
import org.finstack.study.compare.BandSettings;
import picocli.CommandLine.Option;

/**
 * The capacity-band options that {@code compare} and {@code report} share: Monte Carlo samples
 * of each option's band (10th to 90th percentile over the air-side correlation's published
 * scatter) and their random seed.
 */
final class BandOptions {

    @Option(names = "--samples", paramLabel = "N", defaultValue = "" + BandSettings.DEFAULT_SAMPLES,
            description = "Monte Carlo samples of each option's capacity band (10th to 90th percentile over the "
                    + "air-side correlation's published scatter); 0 = no band (default: ${DEFAULT-VALUE})")
    private int samples;

    @Option(names = "--seed", paramLabel = "SEED", defaultValue = "" + BandSettings.DEFAULT_SEED,
            description = "random seed of the capacity bands (default: ${DEFAULT-VALUE})")
    private long seed;

    /** @return the band settings, a bad count refused naming {@code --samples} */
    BandSettings settings() {
        try {
            return new BandSettings(samples, seed);
        } catch (InputException e) {
            throw new InputException("--samples", e.msg(), e.args());
        }
    }
}
