package org.finstack.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.Iterator;
import java.util.Set;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;

/**
 * Reads fields of a JSON object with their dotted path, so every error names the field: a
 * quantity is a string "number unit" or a bare number in SI; counts are whole numbers.
 */
final class JsonFields {

    private final JsonNode node;
    private final String path;

    JsonFields(JsonNode node, String path) {
        this.node = node;
        this.path = path;
        if (node != null && !node.isObject()) {
            throw new InputException(path, Msg.IMPOSSIBLE, "must be a JSON object { ... }");
        }
    }

    String field(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    boolean has(String key) {
        return node != null && node.hasNonNull(key);
    }

    JsonFields object(String key, boolean required) {
        if (!has(key)) {
            if (required) {
                throw new InputException(field(key), Msg.MISSING);
            }
            return new JsonFields(null, field(key));
        }
        return new JsonFields(node.get(key), field(key));
    }

    /**
     * Runs a constructor whose validation names bare fields, and reports them under this path.
     */
    <T> T build(java.util.function.Supplier<T> constructor) {
        try {
            return constructor.get();
        } catch (InputException e) {
            throw e.field().startsWith(path + ".") ? e : e.under(path);
        }
    }

    boolean present() {
        return node != null;
    }

    /** Refuses keys this reader does not know, so a misspelt key is never silently ignored. */
    void onlyKeys(Set<String> known) {
        if (node == null) {
            return;
        }
        for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!known.contains(k)) {
                throw new InputException(field(k), Msg.UNKNOWN_KEY, k);
            }
        }
    }

    double quantity(String key, Dimension dim) {
        if (!has(key)) {
            throw new InputException(field(key), Msg.MISSING);
        }
        return quantityValue(node.get(key), field(key), dim);
    }

    double quantity(String key, Dimension dim, double fallback) {
        return has(key) ? quantity(key, dim) : fallback;
    }

    static double quantityValue(JsonNode v, String field, Dimension dim) {
        if (v.isNumber()) {
            double x = v.asDouble();
            if (!Double.isFinite(x)) {
                throw new InputException(field, Msg.NOT_A_NUMBER, v.asText());
            }
            return x;
        }
        if (v.isTextual()) {
            return Quantities.parse(field, v.asText(), dim);
        }
        throw new InputException(field, Msg.MALFORMED_QUANTITY, v.toString());
    }

    double number(String key, double fallback) {
        if (!has(key)) {
            return fallback;
        }
        JsonNode v = node.get(key);
        if (!v.isNumber()) {
            if (v.isTextual()) {
                return Quantities.parse(field(key), v.asText(), Dimension.DIMENSIONLESS);
            }
            throw new InputException(field(key), Msg.NOT_A_NUMBER, v.toString());
        }
        return v.asDouble();
    }

    int count(String key) {
        if (!has(key)) {
            throw new InputException(field(key), Msg.MISSING);
        }
        JsonNode v = node.get(key);
        if (!v.isNumber()) {
            throw new InputException(field(key), Msg.NOT_WHOLE, v.toString());
        }
        double x = v.asDouble();
        if (x != Math.rint(x) || Math.abs(x) > 1e6) {
            throw new InputException(field(key), Msg.NOT_WHOLE, x);
        }
        return (int) x;
    }

    String text(String key) {
        if (!has(key)) {
            throw new InputException(field(key), Msg.MISSING);
        }
        JsonNode v = node.get(key);
        if (!v.isTextual()) {
            throw new InputException(field(key), Msg.IMPOSSIBLE, "must be text in quotes, got " + v);
        }
        return v.asText();
    }

    /** A list of lists of text, e.g. circuits of tube labels. */
    java.util.List<java.util.List<String>> textLists(String key) {
        JsonNode v = node.get(key);
        if (!v.isArray()) {
            throw new InputException(field(key), Msg.IMPOSSIBLE, "must be a list of lists, e.g. [[\"3-1\", \"2-1\"], ...]");
        }
        java.util.List<java.util.List<String>> out = new java.util.ArrayList<>();
        for (int i = 0; i < v.size(); i++) {
            JsonNode inner = v.get(i);
            if (!inner.isArray()) {
                throw new InputException(field(key) + "[" + i + "]", Msg.IMPOSSIBLE, "must be a list of tube labels");
            }
            java.util.List<String> items = new java.util.ArrayList<>();
            inner.forEach(x -> items.add(x.asText()));
            out.add(items);
        }
        return out;
    }

    /** A list of plain numbers. */
    java.util.List<Double> numbers(String key) {
        JsonNode v = node.get(key);
        if (!v.isArray()) {
            throw new InputException(field(key), Msg.IMPOSSIBLE, "must be a list of numbers");
        }
        java.util.List<Double> out = new java.util.ArrayList<>();
        for (int i = 0; i < v.size(); i++) {
            if (!v.get(i).isNumber()) {
                throw new InputException(field(key) + "[" + i + "]", Msg.NOT_A_NUMBER, v.get(i).toString());
            }
            out.add(v.get(i).asDouble());
        }
        return out;
    }

    String text(String key, String fallback) {
        return has(key) ? text(key) : fallback;
    }
}
