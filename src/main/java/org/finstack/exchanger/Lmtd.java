package org.finstack.exchanger;

import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Limit;
import org.finstack.core.Msg;
import org.finstack.core.Validity;

/**
 * Logarithmic mean temperature difference and its correction factor F for arrangements other
 * than counterflow, so that q = U A F LMTD<sub>counterflow</sub>.
 *
 * <p>LMTD = (&Delta;T<sub>1</sub> - &Delta;T<sub>2</sub>) / ln(&Delta;T<sub>1</sub> /
 * &Delta;T<sub>2</sub>), with &Delta;T<sub>1</sub>, &Delta;T<sub>2</sub> the hot-minus-cold
 * temperature differences at the two ends [K]; its limit &Delta;T<sub>1</sub> when they are equal.
 *
 * <p>F follows from the consistency of the two methods (Shah &amp; Sekulic 2003, Chapter 3): for
 * the same terminal temperatures, q = &epsilon; C<sub>min</sub> &Delta;T<sub>max</sub> = U A F
 * LMTD<sub>cf</sub> gives F = NTU<sub>counterflow</sub>(P, R) / NTU<sub>arrangement</sub>(P, R).
 * P and R refer to one fluid, called fluid 1: P = (temperature change of fluid 1) /
 * (T<sub>hot,in</sub> - T<sub>cold,in</sub>) and R = C<sub>1</sub> / C<sub>2</sub> = (temperature change
 * of fluid 2) / (temperature change of fluid 1). When R &le; 1 fluid 1 is the C<sub>min</sub> fluid
 * (&epsilon; = P, C<sub>r</sub> = R), otherwise the C<sub>max</sub> fluid (&epsilon; = P R,
 * C<sub>r</sub> = 1/R); the arrangement says which role is mixed or which side is the air. Validity:
 * 0 &le; P &lt; the arrangement's largest reachable value, R &ge; 0; 0 &lt; F &le; 1.
 *
 * <p>Worked example: {@code lmtd(30, 10)} = 20 / ln 3 = 18.2048 K.
 */
public final class Lmtd {

    /** Source of the F-factor consistency relation. */
    public static final Citation SOURCE = Refs.SHAH_SEKULIC;

    /** Domain of the correction factor. */
    public static final Validity VALIDITY = Validity.of(
            Limit.of("P", 0, 1),
            Limit.of("R", 0, Double.POSITIVE_INFINITY));

    private Lmtd() {
    }

    /**
     * Logarithmic mean of two end temperature differences.
     *
     * @param dT1 temperature difference at one end [K]
     * @param dT2 temperature difference at the other end [K], of the same sign as dT1
     * @return the LMTD [K], of the same sign; 0 if either difference is 0
     * @throws InputException (fields {@code dT1}, {@code dT2}) if not finite or of opposite sign
     */
    public static double lmtd(double dT1, double dT2) {
        Check.finite("dT1", dT1);
        Check.finite("dT2", dT2);
        if (dT1 == 0 || dT2 == 0) {
            return 0;
        }
        if (dT1 > 0 && dT2 < 0) {
            throw new InputException("dT2", Msg.NOT_ABOVE, dT2, 0.0);
        }
        if (dT1 < 0 && dT2 > 0) {
            throw new InputException("dT2", Msg.NOT_BELOW, dT2, 0.0);
        }
        double x = dT2 / dT1 - 1;
        if (x == 0) {
            return dT1;
        }
        // (dT1 - dT2) / ln(dT1 / dT2) = dT1 x / ln(1 + x); log1p keeps precision when dT1 ~ dT2
        return dT1 * (x / Math.log1p(x));
    }

    /**
     * Correction factor F of an arrangement relative to counterflow.
     *
     * @param a the flow arrangement
     * @param p temperature effectiveness of fluid 1 [-], from 0 to below the arrangement's limit
     * @param r capacity-rate ratio C<sub>1</sub> / C<sub>2</sub> [-], at least 0
     * @return F [-], in (0, 1]; exactly 1 for counterflow, for P = 0 and for R = 0
     * @throws InputException (fields {@code arrangement}, {@code P}, {@code R}) on bad input or a P
     *                        the arrangement cannot reach at this R
     */
    public static double correctionFactor(Arrangement a, double p, double r) {
        if (a == null) {
            throw new InputException("arrangement", Msg.MISSING);
        }
        Check.within("P", p, 0, 1);
        Check.nonNegative("R", r);
        boolean fluid1IsCmin = r <= 1;
        double eps = fluid1IsCmin ? p : p * r;
        double cr = fluid1IsCmin ? r : 1 / r;
        double maxEps = EpsilonNtu.maxEffectiveness(a, cr);
        double maxCf = EpsilonNtu.maxEffectiveness(FlowArrangement.COUNTERFLOW, cr);
        double limit = Math.min(maxEps, maxCf);
        if (eps >= limit) {
            throw new InputException("P", Msg.NOT_BELOW, p, fluid1IsCmin ? limit : limit / r);
        }
        if (p == 0 || a == FlowArrangement.COUNTERFLOW) {
            return 1;
        }
        double ntuCounterflow = EpsilonNtu.ntu(FlowArrangement.COUNTERFLOW, eps, cr);
        double ntuArrangement = EpsilonNtu.ntu(a, eps, cr);
        // counterflow needs the least NTU of all; the solve's tolerance may leave the ratio an ulp above 1
        return Math.min(1, ntuCounterflow / ntuArrangement);
    }
}
