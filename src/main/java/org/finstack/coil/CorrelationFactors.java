package org.finstack.coil;

import org.finstack.airside.AirSideCorrelation;
import org.finstack.airside.AirSideSurface;
import org.finstack.airside.JF;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.Validity;
import org.finstack.core.Warnings;

/**
 * Multipliers on the air-side correlation's Colburn j and Fanning f, carried by a
 * {@link CoilCase}: a rating then uses {@code j fj} in place of j (so the air-side film
 * coefficient h_o = j G cp Pr^(-2/3) scales by fj) and {@code f ff} in place of f (so the core
 * friction term of the Kays &amp; London pressure drop scales by ff; the flow-acceleration term
 * does not depend on f and is unchanged).
 *
 * <p>What they are for: drawing a coil's "true" j and f about the correlation within its
 * published scatter (the Monte Carlo band of {@code study.uncertainty}), and the sensitivity of a
 * result to the correlation (the pressure-drop level of {@code study.diagnosis}). They are an
 * internal hook, not an input of the case file: a case read from a file always has
 * {@link #NONE}, and the correlation's published values are what a user's rating reports.
 *
 * @param j multiplier on Colburn j [-], finite and above zero
 * @param f multiplier on Fanning f [-], finite and above zero
 */
public record CorrelationFactors(double j, double f) {

    /** The correlation as published: both factors 1. */
    public static final CorrelationFactors NONE = new CorrelationFactors(1, 1);

    /** Validates both factors. */
    public CorrelationFactors {
        Check.positive("correlationFactors.j", j);
        Check.positive("correlationFactors.f", f);
    }

    /** @return whether both factors are exactly 1 */
    public boolean isNone() {
        return j == 1 && f == 1;
    }

    /**
     * @param jf a correlation's j and f
     * @return j fj and f ff
     */
    public JF applyTo(JF jf) {
        return isNone() ? jf : new JF(jf.j() * j, jf.f() * f);
    }

    /**
     * The correlation with these factors on its results: the same id, source, validity and
     * scatter, and {@code evaluate} returning j fj and f ff. With {@link #NONE}, the correlation
     * itself.
     *
     * @param correlation the published correlation
     * @return the factored correlation
     */
    public AirSideCorrelation applyTo(AirSideCorrelation correlation) {
        if (isNone()) {
            return correlation;
        }
        if (correlation instanceof Factored fc) {
            return new Factored(fc.published(), new CorrelationFactors(fc.factors().j() * j, fc.factors().f() * f));
        }
        return new Factored(correlation, this);
    }

    /** A published correlation whose j and f are multiplied by factors. */
    private record Factored(AirSideCorrelation published, CorrelationFactors factors) implements AirSideCorrelation {

        @Override
        public String id() {
            return published.id();
        }

        @Override
        public String finType() {
            return published.finType();
        }

        @Override
        public Citation source() {
            return published.source();
        }

        @Override
        public Validity validity() {
            return published.validity();
        }

        @Override
        public double scatterJ() {
            return published.scatterJ();
        }

        @Override
        public double scatterF() {
            return published.scatterF();
        }

        @Override
        public double scatterBand() {
            return published.scatterBand();
        }

        @Override
        public JF evaluate(AirSideSurface s, double reDc, Warnings w) {
            return factors.applyTo(published.evaluate(s, reDc, w));
        }
    }
}
