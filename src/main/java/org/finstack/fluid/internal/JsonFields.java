package org.finstack.fluid.internal;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import org.finstack.core.FinstackException;
import org.finstack.core.Msg;

/**
 * Reading the fluid data files (JSON on the class path): the file itself, its format version, and
 * required fields. Every failure is a {@link FinstackException} naming the file or the field.
 */
public final class JsonFields {

    private static final ObjectMapper JSON = new ObjectMapper();

    private JsonFields() {
    }

    /**
     * @param resource absolute class-path resource, e.g. {@code /org/finstack/fluid/r134a.json}
     * @return the file's root node
     * @throws FinstackException ({@link Msg#FILE_UNREADABLE}) if it is missing or not JSON
     */
    public static JsonNode read(String resource) {
        try (InputStream in = JsonFields.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new FinstackException(Msg.FILE_UNREADABLE, resource, "not on the class path");
            }
            return JSON.readTree(in);
        } catch (IOException e) {
            throw new FinstackException(Msg.FILE_UNREADABLE, resource, e.getMessage());
        }
    }

    /**
     * @param resource absolute class-path resource
     * @param format   the format version the reader understands
     * @return the file's root node
     * @throws FinstackException as {@link #read}, or ({@link Msg#NEWER_VERSION}) if the file's
     *                           {@code format} is another version
     */
    public static JsonNode read(String resource, int format) {
        JsonNode root = read(resource);
        int found = root.path("format").asInt(-1);
        if (found != format) {
            throw new FinstackException(Msg.NEWER_VERSION, found, format);
        }
        return root;
    }

    /**
     * @param n   node
     * @param key field name
     * @return the field
     * @throws FinstackException if it is missing or null
     */
    public static JsonNode req(JsonNode n, String key) {
        JsonNode v = n.get(key);
        if (v == null || v.isNull()) {
            throw new FinstackException(Msg.MALFORMED_FILE, "missing \"" + key + "\"");
        }
        return v;
    }

    /**
     * @param n   node
     * @param key field name
     * @return the field as text
     * @throws FinstackException if it is missing
     */
    public static String text(JsonNode n, String key) {
        return req(n, key).asText();
    }

    /**
     * @param n   node
     * @param key field name
     * @return the field's number
     * @throws FinstackException if it is missing or not a number
     */
    public static double num(JsonNode n, String key) {
        JsonNode v = req(n, key);
        if (!v.isNumber()) {
            throw new FinstackException(Msg.MALFORMED_FILE, "\"" + key + "\" is not a number");
        }
        return v.asDouble();
    }

    /**
     * @param n   node
     * @param key field name
     * @return the field's array of numbers
     * @throws FinstackException if it is missing or holds a value that is not a number
     */
    public static double[] arr(JsonNode n, String key) {
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
}
