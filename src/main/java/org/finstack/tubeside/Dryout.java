package org.finstack.tubeside;

import java.util.Locale;

import org.finstack.core.Citation;
import org.finstack.core.Warnings;

/**
 * The dryout treatment applied to every {@link BoilingCorrelation}: the wet-wall correlations
 * over-predict once the annular film breaks up at high quality, so above the onset quality
 * x_di = {@value #ONSET_QUALITY} the coefficient is interpolated linearly in quality from the
 * correlation's value at x_di to the vapour-only coefficient at x = 1:
 * <pre>
 *   h(x) = h_wet(x_di) + (x - x_di) / (1 - x_di) (h_v - h_wet(x_di)),   x_di &lt; x &le; 1
 *   h_v  = Gnielinski 1976, Re_v = G D / mu_v, Pr_v, uniform heat flux
 * </pre>
 * This is common practice for coil rating (a fixed onset quality rather than a mechanistic
 * criterion such as Wojtan, Ursenbacher &amp; Thome 2005); every use adds a warning. It
 * ignores the dependence of the dryout quality on mass flux and heat flux.
 *
 * <p>Worked example ({@link GungorWinterton1987}, fixture R134a near 5 °C of the package comment,
 * D = 8 mm, G = 200 kg/(m2 s), q = 10 kW/m2): h(0.9) = 2896.34 W/(m2 K), h_v = 395.799 W/(m2 K),
 * so h(0.95) = 1646.07 W/(m2 K).
 */
public final class Dryout {

    /** The treatment (no published source: a trade convention). */
    public static final Citation SOURCE = Citation.of("common practice",
            "Linear interpolation between the wet-wall coefficient at a fixed dryout-onset quality and the"
                    + " vapour-only Gnielinski (1976) coefficient at x = 1; common practice in coil rating");

    /** Dryout onset quality [-] (common practice). */
    public static final double ONSET_QUALITY = 0.9;

    private Dryout() {
    }

    /**
     * @param c the wet-wall correlation
     * @param p properties
     * @param f flow
     * @param w where warnings go
     * @return the coefficient with the dryout treatment [W/(m2 K)]
     */
    public static double apply(BoilingCorrelation c, SaturatedProperties p, TubeFlow f, Warnings w) {
        double x = f.quality();
        if (x <= ONSET_QUALITY) {
            return c.wetWall(p, f, w);
        }
        BoilingCorrelation.requireHeatFlux(f);
        if (w.keeps()) {
            w.add(String.format(Locale.ROOT, "%s: quality %.3f is above the dryout onset %.2f; the coefficient is"
                    + " interpolated linearly to the vapour-only value at x = 1 (common practice)",
                    c.source().key(), x, ONSET_QUALITY));
        }
        double hOnset = c.wetWall(p, f.withQuality(ONSET_QUALITY), w);
        double hv = vapourOnly(p, f, w);
        return hOnset + (x - ONSET_QUALITY) / (1 - ONSET_QUALITY) * (hv - hOnset);
    }

    /**
     * @param p properties
     * @param f flow (quality ignored: all the mass flux as vapour)
     * @param w where warnings go
     * @return vapour-only coefficient [W/(m2 K)]
     */
    public static double vapourOnly(SaturatedProperties p, TubeFlow f, Warnings w) {
        double re = Tube.reynolds(f.massFlux(), f.diameter(), p.vapourViscosity());
        return Gnielinski1976.heatTransferCoefficient(re, p.vapourPrandtl(), p.vapourConductivity(), f.diameter(),
                Gnielinski1976.Wall.UNIFORM_HEAT_FLUX, w);
    }
}
