package org.finstack.fluid.transport;

import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/** Power series helpers for the blend correlations. */
final class Polynomials {

    private Polynomials() {
    }

    /** @return a copy of c, every value checked finite; the field named for messages */
    static double[] checked(String field, double[] c) {
        if (c == null) {
            throw new InputException(field, Msg.MISSING);
        }
        double[] out = c.clone();
        for (double v : out) {
            Check.finite(field, v);
        }
        return out;
    }

    /** @return sum c[i] x^i, i from 0 (Horner) */
    static double fromZero(double[] c, double x) {
        double s = 0;
        for (int i = c.length - 1; i >= 0; i--) {
            s = s * x + c[i];
        }
        return s;
    }

    /** @return sum c[i] x^(i+1), i from 0 (Horner) */
    static double fromOne(double[] c, double x) {
        return x * fromZero(c, x);
    }
}
