package org.finstack.fluid.transport;

import com.fasterxml.jackson.databind.JsonNode;
import org.finstack.core.Citation;
import org.finstack.core.FinstackException;
import org.finstack.core.Msg;

/** Reading helpers for the coefficient files. */
final class Data {

    private Data() {
    }

    static JsonNode req(JsonNode n, String key) {
        JsonNode v = n.get(key);
        if (v == null || v.isNull()) {
            throw new FinstackException(Msg.MALFORMED_FILE, "missing \"" + key + "\"");
        }
        return v;
    }

    static double num(JsonNode n, String key) {
        JsonNode v = req(n, key);
        if (!v.isNumber()) {
            throw new FinstackException(Msg.MALFORMED_FILE, "\"" + key + "\" is not a number");
        }
        return v.asDouble();
    }

    static String text(JsonNode n, String key) {
        return req(n, key).asText();
    }

    static double[] arr(JsonNode n, String key) {
        JsonNode v = req(n, key);
        double[] out = new double[v.size()];
        for (int i = 0; i < out.length; i++) {
            if (!v.get(i).isNumber()) {
                throw new FinstackException(Msg.MALFORMED_FILE, "\"" + key + "\" holds a value that is not a number");
            }
            out[i] = v.get(i).asDouble();
        }
        return out;
    }

    static Citation citation(JsonNode n) {
        JsonNode s = req(n, "source");
        return Citation.of(text(s, "key"), text(s, "reference"));
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
