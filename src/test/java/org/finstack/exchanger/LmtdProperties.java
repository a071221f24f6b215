package org.finstack.exchanger;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

/** Invariants of the F factor and the agreement of the LMTD and effectiveness-NTU methods. */
class LmtdProperties {

    @Provide
    Arbitrary<Arrangement> arrangements() {
        return Arbitraries.of(EpsilonNtuProperties.allArrangements());
    }

    @Property(tries = 300)
    void correctionFactorLiesInZeroToOne(@ForAll("arrangements") Arrangement a,
            @ForAll @Scale(6) @DoubleRange(min = 0, max = 0.99) double share,
            @ForAll @Scale(6) @DoubleRange(min = 0, max = 3) double r) {
        double p = share * maxP(a, r);
        double f = Lmtd.correctionFactor(a, p, r);
        assertThat(f).as(a.id()).isGreaterThan(0).isLessThanOrEqualTo(1);
    }

    @Property(tries = 200)
    void correctionFactorTendsToOneAsRVanishes(@ForAll("arrangements") Arrangement a,
            @ForAll @Scale(6) @DoubleRange(min = 0.01, max = 0.95) double p) {
        assertThat(Lmtd.correctionFactor(a, p, 1e-7)).as(a.id()).isCloseTo(1, within(1e-5));
    }

    /**
     * q = U A F LMTD (counterflow terminal differences) must equal q = eps C_min dT_max for every
     * arrangement (Shah &amp; Sekulic 2003, Chapter 3).
     */
    @Property(tries = 300)
    void lmtdAndEffectivenessMethodsGiveTheSameHeat(@ForAll("arrangements") Arrangement a,
            @ForAll @Scale(6) @DoubleRange(min = 0.05, max = 5) double ntu,
            @ForAll @Scale(6) @DoubleRange(min = 100, max = 5000) double cHot,
            @ForAll @Scale(6) @DoubleRange(min = 100, max = 5000) double cCold,
            @ForAll @Scale(6) @DoubleRange(min = 260, max = 300) double tColdIn,
            @ForAll @Scale(6) @DoubleRange(min = 1, max = 60) double dTmax) {
        double cMin = Math.min(cHot, cCold);
        double cr = cMin / Math.max(cHot, cCold);
        double eps = EpsilonNtu.effectiveness(a, ntu, cr);
        Assume.that(eps < 0.999 * EpsilonNtu.maxEffectiveness(a, cr));
        double ua = ntu * cMin;
        double tHotIn = tColdIn + dTmax;
        double q = eps * cMin * dTmax;
        double tHotOut = tHotIn - q / cHot;
        double tColdOut = tColdIn + q / cCold;
        double p = (tHotIn - tHotOut) / dTmax;  // fluid 1 = hot
        double r = cHot / cCold;
        double f = Lmtd.correctionFactor(a, p, r);
        double qLmtd = ua * f * Lmtd.lmtd(tHotIn - tColdOut, tHotOut - tColdIn);
        assertThat(qLmtd).as(a.id()).isCloseTo(q, within(1e-8 * q));
    }

    private static double maxP(Arrangement a, double r) {
        double cr = r <= 1 ? r : 1 / r;
        double eps = EpsilonNtu.maxEffectiveness(a, cr);
        double p = r <= 1 ? eps : eps / r;
        return Math.min(p, 1.0);
    }
}
