package org.finstack.fluid.eos;

/**
 * The reduced residual Helmholtz energy and its derivatives at one (delta, tau).
 *
 * @param a   alphar [-]
 * @param ad  d alphar / d delta [-]
 * @param add d2 alphar / d delta2 [-]
 * @param at  d alphar / d tau [-]
 * @param att d2 alphar / d tau2 [-]
 * @param adt d2 alphar / d delta d tau [-]
 */
public record Derivatives(double a, double ad, double add, double at, double att, double adt) {

    /**
     * @param acc accumulator in the order a, ad, add, at, att, adt
     * @return the record
     */
    static Derivatives of(double[] acc) {
        return new Derivatives(acc[0], acc[1], acc[2], acc[3], acc[4], acc[5]);
    }
}
