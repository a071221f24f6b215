package org.finstack.study.uncertainty;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.finstack.airside.AirSideCorrelation;
import org.finstack.airside.AirSideCorrelations;
import org.finstack.coil.AirInlet;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.CorrelationFactors;
import org.finstack.coil.Rating;
import org.finstack.coil.RefrigerantSide;
import org.finstack.coil.RefrigerantSide.Target;
import org.finstack.core.Check;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * A Monte Carlo band of a rating's capacity and air pressure drop (10th, 50th and 90th
 * percentiles) over the published scatter of the air-side correlation and the inputs'
 * tolerances; reproducible with a seed.
 *
 * <p><b>Correlation scatter.</b> j and f are multiplied by factors {@code 1 + sigma z} (z standard
 * normal, cut at ±4) with sigma from the paper's share of data within its band
 * ({@link NormalCoverage}: e.g. 88.6 % within ±15 % gives sigma = 9.49 %).
 *
 * <p><b>How the factors act.</b> Each sample is rated with its factors as the case's
 * {@link CorrelationFactors}: the rating model uses {@code j fj} and {@code f ff} wherever it
 * evaluates the air-side correlation, so the j factor moves the air film coefficient, the fin
 * efficiency and the wet-coil split as the coil itself responds, and the f factor moves the core
 * friction term of the Kays &amp; London pressure drop (not its flow-acceleration term). A
 * factor is held at {@link #MIN_FACTOR} or more (reached only by a scatter far beyond the
 * published correlations': sigma 0.1 cut at 4 sigma gives 0.6).
 *
 * <p><b>Inputs.</b> Each sample draws entering air temperature, relative humidity (held in 0..1),
 * airflow, saturation temperature and the held superheat or subcooling (not below zero) from
 * normal distributions with the {@link InputTolerances}; seven normals are drawn per sample in a
 * fixed order whatever the tolerances, so two bands with the same seed share their draws. A
 * sample whose rating fails (e.g. an unreachable superheat) is counted and left out.
 *
 * <p>Percentiles: linear interpolation between order statistics (Hyndman &amp; Fan 1996,
 * definition 7).
 *
 * @param capacityP10          [W]
 * @param capacityP50          [W]
 * @param capacityP90          [W]
 * @param pressureDropP10      air pressure drop [Pa]
 * @param pressureDropP50      [Pa]
 * @param pressureDropP90      [Pa]
 * @param nominalCapacity      capacity of the case as given [W]
 * @param nominalPressureDrop  air pressure drop of the case as given [Pa]
 * @param samples              samples asked for
 * @param failedSamples        samples whose rating failed and were left out
 * @param seed                 the random seed
 * @param sigmaJ               standard deviation of the j factor [-]
 * @param sigmaF               standard deviation of the f factor [-]
 */
public record UncertaintyBand(double capacityP10, double capacityP50, double capacityP90, double pressureDropP10,
        double pressureDropP50, double pressureDropP90, double nominalCapacity, double nominalPressureDrop,
        int samples, int failedSamples, long seed, double sigmaJ, double sigmaF) {

    /** Most samples accepted (a bound on run time). */
    public static final int MAX_SAMPLES = 100_000;

    /** Smallest j or f factor drawn [-]; a floor of this program that keeps the factors positive. */
    static final double MIN_FACTOR = 0.05;

    /** Largest standard deviation of a correlation factor accepted [-]. */
    static final double MAX_SIGMA = 1;

    /** Draws beyond this many standard deviations are cut (keeps factors positive). */
    static final double CUT = 4;

    /** @return (p90 - p10) / p50 of capacity [-] */
    public double capacityRelativeWidth() {
        return (capacityP90 - capacityP10) / capacityP50;
    }

    /**
     * The band with the correlation's scatter only (inputs exact).
     *
     * @param c       the case (not a required-capacity case)
     * @param samples number of samples, 3 to {@link #MAX_SAMPLES}
     * @param seed    random seed
     * @return the band
     */
    public static UncertaintyBand of(CoilCase c, int samples, long seed) {
        return of(c, InputTolerances.NONE, samples, seed);
    }

    /**
     * The band over the input tolerances and the air-side correlation's published scatter.
     *
     * @param c          the case (not a required-capacity case)
     * @param tolerances standard uncertainties of the inputs
     * @param samples    number of samples, 3 to {@link #MAX_SAMPLES}
     * @param seed       random seed
     * @return the band
     */
    public static UncertaintyBand of(CoilCase c, InputTolerances tolerances, int samples, long seed) {
        AirSideCorrelation corr = AirSideCorrelations.standard("coil.finType", c.coil().finType());
        return of(c, tolerances, NormalCoverage.sigma(corr.scatterJ(), corr.scatterBand()),
                NormalCoverage.sigma(corr.scatterF(), corr.scatterBand()), samples, seed);
    }

    /**
     * The band with stated standard deviations of the j and f factors in place of the
     * correlation's published scatter (for a user who trusts the correlation more or less for
     * this coil, and for tests).
     *
     * @param c          the case (not a required-capacity case); its own correlation factors, if
     *                   any, are the centre the samples' factors multiply
     * @param tolerances standard uncertainties of the inputs
     * @param sigmaJ     standard deviation of the j factor [-], 0 to 1
     * @param sigmaF     standard deviation of the f factor [-], 0 to 1
     * @param samples    number of samples, 3 to {@link #MAX_SAMPLES}
     * @param seed       random seed
     * @return the band
     */
    public static UncertaintyBand of(CoilCase c, InputTolerances tolerances, double sigmaJ, double sigmaF, int samples,
            long seed) {
        Check.within("samples", samples, 3, MAX_SAMPLES);
        Check.within("sigmaJ", sigmaJ, 0, MAX_SIGMA);
        Check.within("sigmaF", sigmaF, 0, MAX_SIGMA);
        if (c.refrigerant().target() instanceof Target.Capacity) {
            throw new InputException("refrigerant.requiredCapacity", Msg.IMPOSSIBLE,
                    "fixes the capacity; give a saturation temperature with superheat or subcooling for a capacity band");
        }
        Rating nominal = CoilModels.rate(c);
        CorrelationFactors centre = c.factors();
        SplittableRandom random = new SplittableRandom(seed);
        double[] q = new double[samples];
        double[] dp = new double[samples];
        int ok = 0;
        for (int i = 0; i < samples; i++) {
            double[] z = new double[7];
            for (int k = 0; k < z.length; k++) {
                z[k] = Math.max(-CUT, Math.min(CUT, random.nextGaussian()));
            }
            CorrelationFactors drawn = new CorrelationFactors(centre.j() * factor(sigmaJ, z[5]),
                    centre.f() * factor(sigmaF, z[6]));
            try {
                Rating r = CoilModels.rate(perturb(c, tolerances, z).withFactors(drawn));
                q[ok] = r.capacity();
                dp[ok] = r.airPressureDrop();
                ok++;
            } catch (FinstackException ex) {
                // a sample outside what the model can rate is counted below and left out
                continue;
            }
        }
        if (ok < 3) {
            throw new InputException("samples", Msg.IMPOSSIBLE, "only " + ok + " of " + samples
                    + " perturbed ratings succeeded; reduce the tolerances");
        }
        double[] qs = Arrays.copyOf(q, ok);
        double[] ps = Arrays.copyOf(dp, ok);
        Arrays.sort(qs);
        Arrays.sort(ps);
        return new UncertaintyBand(percentile(qs, 0.1), percentile(qs, 0.5), percentile(qs, 0.9), percentile(ps, 0.1),
                percentile(ps, 0.5), percentile(ps, 0.9), nominal.capacity(), nominal.airPressureDrop(), samples,
                samples - ok, seed, sigmaJ, sigmaF);
    }

    /** 1 + sigma z, held at {@link #MIN_FACTOR} or more. */
    static double factor(double sigma, double z) {
        return Math.max(MIN_FACTOR, 1 + sigma * z);
    }

    /**
     * The case with its inputs moved by z standard uncertainties.
     *
     * @param c the case
     * @param t standard uncertainties
     * @param z standard normal draws: air temperature, humidity, airflow, saturation, outlet condition
     * @return the perturbed case
     */
    static CoilCase perturb(CoilCase c, InputTolerances t, double[] z) {
        AirInlet a = c.air();
        double flowFactor = Math.max(0.05, 1 + t.airflowRelative() * z[2]);
        double rh = Math.max(0, Math.min(1, a.relativeHumidity() + t.relativeHumidity() * z[1]));
        AirInlet air = new AirInlet(a.temperature() + t.airTemperature() * z[0], a.faceVelocity() * flowFactor,
                a.volumeFlow() * flowFactor, a.pressure(), rh);
        RefrigerantSide r = c.refrigerant();
        double dOut = t.outletCondition() * z[4];
        Target target = r.target();
        if (target instanceof Target.Superheat s) {
            target = new Target.Superheat(Math.max(0, s.kelvin() + dOut));
        } else if (target instanceof Target.Subcooling s) {
            target = new Target.Subcooling(Math.max(0, s.kelvin() + dOut));
        }
        RefrigerantSide side = new RefrigerantSide(r.fluid(), r.duty(),
                r.saturationTemperature() + t.saturationTemperature() * z[3], r.convention(), r.insideCoefficient(),
                r.liquidTemperature(), r.inletTemperature(), target, r.model(), r.segments());
        return c.withAir(air).withRefrigerant(side);
    }

    /**
     * Percentile by linear interpolation between order statistics (Hyndman &amp; Fan 1996,
     * definition 7): position h = (n - 1) p from 0, value x[floor h] + (h - floor h)(x[floor h + 1] - x[floor h]).
     *
     * @param sorted values in ascending order, at least one
     * @param p      probability [-], 0..1
     * @return the percentile
     */
    public static double percentile(double[] sorted, double p) {
        Check.within("p", p, 0, 1);
        if (sorted.length == 0) {
            throw new InputException("values", Msg.MISSING);
        }
        double h = (sorted.length - 1) * p;
        int lo = (int) Math.floor(h);
        int hi = Math.min(sorted.length - 1, lo + 1);
        return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
    }

    /**
     * Times one band (for the {@code bench} command).
     *
     * @param c       the case
     * @param samples samples
     * @param seed    seed
     * @return the band, the wall time and the ratings per second
     */
    public static Timing time(CoilCase c, int samples, long seed) {
        long t0 = System.nanoTime();
        UncertaintyBand b = of(c, samples, seed);
        double seconds = (System.nanoTime() - t0) / 1e9;
        int ratings = samples + 1;
        return new Timing(b, seconds, ratings / seconds);
    }

    /**
     * The result of {@link #time}.
     *
     * @param band             the band computed
     * @param seconds          wall time [s]
     * @param ratingsPerSecond ratings (samples plus the nominal rating) per second [1/s]
     */
    public record Timing(UncertaintyBand band, double seconds, double ratingsPerSecond) {
    }
}
