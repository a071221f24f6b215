package org.finstack.fluid.eos;

/**
 * A group of terms of the residual Helmholtz energy that share one functional form. Immutable.
 */
public interface TermGroup {

    /**
     * Adds this group's contribution to alphar and its derivatives.
     *
     * @param delta reduced density [-], above zero
     * @param tau   inverse reduced temperature [-], above zero
     * @param acc   accumulator: a, ad, add, at, att, adt
     */
    void addTo(double delta, double tau, double[] acc);
}
