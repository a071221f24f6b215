package org.finstack.fluid.transport;

import com.fasterxml.jackson.databind.JsonNode;
import org.finstack.core.Citation;
import org.finstack.fluid.internal.JsonFields;

/** Reading helpers for the coefficient files (the plain fields: {@link JsonFields}). */
final class Data {

    private Data() {
    }

    static Citation citation(JsonNode n) {
        JsonNode s = JsonFields.req(n, "source");
        return Citation.of(JsonFields.text(s, "key"), JsonFields.text(s, "reference"));
    }

    /** @return sum of c[i] x^e[i] */
    static double powerSum(double[] c, double[] e, double x) {
        double s = 0;
        for (int i = 0; i < c.length; i++) {
            s += c[i] * Math.pow(x, e[i]);
        }
        return s;
    }
}
