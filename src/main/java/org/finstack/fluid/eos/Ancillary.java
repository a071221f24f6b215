package org.finstack.fluid.eos;

/**
 * An ancillary equation for a saturation property, used only to start the phase-equilibrium
 * solver. With {@code theta = 1 - T / T_r} and {@code S = sum_i n_i theta^t_i}:
 * <ul>
 * <li>{@link Form#EXP}: {@code y = y_r exp(f S)}, where f = T_r / T if the tau factor is used,
 * else 1 (vapour pressure, saturated vapour density);</li>
 * <li>{@link Form#LINEAR}: {@code y = y_r (1 + S)} (saturated liquid density).</li>
 * </ul>
 * Immutable.
 *
 * @param form          the form
 * @param tauFactor     whether S is multiplied by T_r / T
 * @param reducingT     T_r [K]
 * @param reducingValue y_r [Pa or mol/m3]
 * @param n             coefficients
 * @param t             exponents
 */
public record Ancillary(Form form, boolean tauFactor, double reducingT, double reducingValue, double[] n,
        double[] t) {

    /** The two forms. */
    public enum Form {
        /** y = y_r exp(f S). */
        EXP,
        /** y = y_r (1 + S). */
        LINEAR
    }

    /** Copies the arrays. */
    public Ancillary {
        if (n.length != t.length) {
            throw new IllegalArgumentException("ancillary: coefficient arrays differ in length");
        }
        n = n.clone();
        t = t.clone();
    }

    /**
     * @param temperature T [K], at most T_r
     * @return the property [unit of y_r]
     */
    public double at(double temperature) {
        double theta = Math.max(0, 1 - temperature / reducingT);
        double s = 0;
        for (int i = 0; i < n.length; i++) {
            s += n[i] * Math.pow(theta, t[i]);
        }
        if (form == Form.LINEAR) {
            return reducingValue * (1 + s);
        }
        return reducingValue * Math.exp((tauFactor ? reducingT / temperature : 1) * s);
    }

    @Override
    public double[] n() {
        return n.clone();
    }

    @Override
    public double[] t() {
        return t.clone();
    }
}
