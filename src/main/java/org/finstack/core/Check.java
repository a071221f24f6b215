package org.finstack.core;

/** Up-front checks of inputs that throw an {@link InputException} naming the field. */
public final class Check {

    private Check() {
    }

    /**
     * @param field field path
     * @param v     value
     * @return v, if finite and above zero
     */
    public static double positive(String field, double v) {
        finite(field, v);
        if (!(v > 0)) {
            throw new InputException(field, Msg.NOT_POSITIVE, v);
        }
        return v;
    }

    /**
     * @param field field path
     * @param v     value
     * @return v, if finite and not below zero
     */
    public static double nonNegative(String field, double v) {
        finite(field, v);
        if (v < 0) {
            throw new InputException(field, Msg.NEGATIVE, v);
        }
        return v;
    }

    /**
     * @param field field path
     * @param v     value
     * @param min   lower bound (inclusive)
     * @param max   upper bound (inclusive)
     * @return v, if within bounds
     */
    public static double within(String field, double v, double min, double max) {
        finite(field, v);
        if (v < min || v > max) {
            throw new InputException(field, Msg.OUT_OF_BOUNDS, v, min, max);
        }
        return v;
    }

    /**
     * @param field field path
     * @param v     value
     * @return v, if finite
     */
    public static double finite(String field, double v) {
        if (!Double.isFinite(v)) {
            throw new InputException(field, Msg.NOT_A_NUMBER, v);
        }
        return v;
    }

    /**
     * @param field field path
     * @param v     value
     * @return v, if at least one
     */
    public static int atLeastOne(String field, int v) {
        if (v < 1) {
            throw new InputException(field, Msg.NOT_POSITIVE, v);
        }
        return v;
    }
}
