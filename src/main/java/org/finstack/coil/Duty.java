package org.finstack.coil;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/** What the refrigerant does in the coil. */
public enum Duty {
    /** Refrigerant condenses and heats the air. */
    CONDENSER,
    /** Refrigerant evaporates and cools the air. */
    EVAPORATOR;

    /** @return the name used in case files */
    public String id() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * @param field input field, for messages
     * @param text  {@code condenser} or {@code evaporator}
     * @return the duty
     */
    public static Duty parse(String field, String text) {
        for (Duty d : values()) {
            if (d.id().equalsIgnoreCase(text == null ? "" : text.strip())) {
                return d;
            }
        }
        throw new InputException(field, Msg.UNKNOWN_NAME, text,
                Arrays.stream(values()).map(Duty::id).collect(Collectors.joining(", ")));
    }
}
