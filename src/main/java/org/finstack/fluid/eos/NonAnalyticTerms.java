package org.finstack.fluid.eos;

/**
 * The non-analytic terms that Span &amp; Wagner (1996) added to the carbon-dioxide equation to
 * reproduce the behaviour close to the critical point:
 * <pre>
 *   alphar_i = n_i Delta^b_i delta psi
 *   Delta = theta^2 + B_i [(delta - 1)^2]^a_i
 *   theta = (1 - tau) + A_i [(delta - 1)^2]^(1 / (2 beta_i))
 *   psi   = exp(-C_i (delta - 1)^2 - D_i (tau - 1)^2)
 * </pre>
 * The derivatives are those written out by Span &amp; Wagner (1996), Table 32. At delta = 1 exactly
 * the second density derivative has a removable singularity; the density is then moved by
 * 1e-10 (relative), far below any other error of the equation.
 */
public final class NonAnalyticTerms implements TermGroup {

    private static final double NUDGE = 1e-10;

    private final double[] n;
    private final double[] a;
    private final double[] b;
    private final double[] beta;
    private final double[] bigA;
    private final double[] bigB;
    private final double[] bigC;
    private final double[] bigD;

    /**
     * @param n    coefficients
     * @param a    exponents a
     * @param b    exponents b
     * @param beta exponents beta
     * @param bigA coefficients A
     * @param bigB coefficients B
     * @param bigC coefficients C
     * @param bigD coefficients D
     */
    public NonAnalyticTerms(double[] n, double[] a, double[] b, double[] beta, double[] bigA,
            double[] bigB, double[] bigC, double[] bigD) {
        for (double[] x : new double[][] {a, b, beta, bigA, bigB, bigC, bigD}) {
            if (x.length != n.length) {
                throw new IllegalArgumentException("non-analytic terms: coefficient arrays differ in length");
            }
        }
        this.n = n.clone();
        this.a = a.clone();
        this.b = b.clone();
        this.beta = beta.clone();
        this.bigA = bigA.clone();
        this.bigB = bigB.clone();
        this.bigC = bigC.clone();
        this.bigD = bigD.clone();
    }

    @Override
    public void addTo(double delta, double tau, double[] acc) {
        double dm1 = delta - 1;
        if (Math.abs(dm1) < NUDGE) {
            dm1 = dm1 < 0 ? -NUDGE : NUDGE;
            delta = 1 + dm1;
        }
        double sq = dm1 * dm1;
        double tm1 = tau - 1;
        for (int i = 0; i < n.length; i++) {
            double ai = a[i];
            double bi = b[i];
            double be = beta[i];
            double e = 1 / (2 * be);
            double sqE = Math.pow(sq, e);
            double theta = (1 - tau) + bigA[i] * sqE;
            double big = theta * theta + bigB[i] * Math.pow(sq, ai);
            double psi = Math.exp(-bigC[i] * sq - bigD[i] * tm1 * tm1);

            double sqEm1 = sqE / sq;
            double bigD1 = dm1 * (bigA[i] * theta * (2 / be) * sqEm1 + 2 * bigB[i] * ai * Math.pow(sq, ai - 1));
            double bigD2 = bigD1 / dm1 + sq * (4 * bigB[i] * ai * (ai - 1) * Math.pow(sq, ai - 2)
                    + 2 * bigA[i] * bigA[i] * (1 / be) * (1 / be) * sqEm1 * sqEm1
                    + bigA[i] * theta * (4 / be) * (e - 1) * sqEm1 / sq);

            double pb = Math.pow(big, bi);
            double pb1 = Math.pow(big, bi - 1);
            double pb2 = Math.pow(big, bi - 2);
            double db = bi * pb1 * bigD1;
            double dbb = bi * (pb1 * bigD2 + (bi - 1) * pb2 * bigD1 * bigD1);
            double tb = -2 * theta * bi * pb1;
            double ttb = 2 * bi * pb1 + 4 * theta * theta * bi * (bi - 1) * pb2;
            double dtb = -bigA[i] * bi * (2 / be) * pb1 * dm1 * sqEm1 - 2 * theta * bi * (bi - 1) * pb2 * bigD1;

            double psiD = -2 * bigC[i] * dm1 * psi;
            double psiDD = (2 * bigC[i] * sq - 1) * 2 * bigC[i] * psi;
            double psiT = -2 * bigD[i] * tm1 * psi;
            double psiTT = (2 * bigD[i] * tm1 * tm1 - 1) * 2 * bigD[i] * psi;
            double psiDT = 4 * bigC[i] * bigD[i] * dm1 * tm1 * psi;

            double ni = n[i];
            acc[0] += ni * pb * delta * psi;
            acc[1] += ni * (pb * (psi + delta * psiD) + db * delta * psi);
            acc[2] += ni * (pb * (2 * psiD + delta * psiDD) + 2 * db * (psi + delta * psiD) + dbb * delta * psi);
            acc[3] += ni * delta * (tb * psi + pb * psiT);
            acc[4] += ni * delta * (ttb * psi + 2 * tb * psiT + pb * psiTT);
            acc[5] += ni * (pb * (psiT + delta * psiDT) + delta * db * psiT + tb * (psi + delta * psiD)
                    + dtb * delta * psi);
        }
    }
}
