package org.finstack.geometry;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/** How the tubes of successive rows stand relative to each other. */
public enum Arrangement {
    /** Each row offset by half a transverse pitch (the usual coil pattern). */
    STAGGERED,
    /** Tubes of successive rows in line with each other. */
    INLINE;

    /** @return the name used in case files */
    public String id() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * @param field input field, for messages
     * @param text  {@code staggered} or {@code inline} (any case)
     * @return the arrangement
     */
    public static Arrangement parse(String field, String text) {
        for (Arrangement a : values()) {
            if (a.id().equalsIgnoreCase(text == null ? "" : text.strip())) {
                return a;
            }
        }
        throw new InputException(field, Msg.UNKNOWN_NAME, text,
                Arrays.stream(values()).map(Arrangement::id).collect(Collectors.joining(", ")));
    }
}
