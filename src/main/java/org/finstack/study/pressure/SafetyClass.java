package org.finstack.study.pressure;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * Refrigerant safety class of ANSI/ASHRAE Standard 34 and ISO 817: a letter for toxicity (A lower,
 * B higher) and a number for flammability (1 no flame propagation, 2L lower flammability with a
 * burning velocity of at most 10 cm/s, 2 flammable, 3 higher flammability).
 */
public enum SafetyClass {
    /** Lower toxicity, no flame propagation. */
    A1,
    /** Lower toxicity, lower flammability. */
    A2L,
    /** Lower toxicity, flammable. */
    A2,
    /** Lower toxicity, higher flammability. */
    A3,
    /** Higher toxicity, no flame propagation. */
    B1,
    /** Higher toxicity, lower flammability. */
    B2L,
    /** Higher toxicity, flammable. */
    B2,
    /** Higher toxicity, higher flammability. */
    B3;

    /** @return whether the refrigerant propagates a flame (class 2L, 2 or 3) and so has an LFL */
    public boolean flammable() {
        return this != A1 && this != B1;
    }

    /** @return whether the refrigerant is of higher toxicity (class B) */
    public boolean higherToxicity() {
        return name().startsWith("B");
    }

    /**
     * Reads a class as written, e.g. {@code "a2l"} or {@code "A2L"}.
     *
     * @param field the input field, for messages
     * @param text  the class
     * @return the class
     * @throws InputException {@link Msg#UNKNOWN_NAME} for anything else
     */
    public static SafetyClass parse(String field, String text) {
        String t = text == null ? "" : text.strip().toUpperCase(Locale.ROOT);
        for (SafetyClass c : values()) {
            if (c.name().equals(t)) {
                return c;
            }
        }
        throw new InputException(field, Msg.UNKNOWN_NAME, text,
                Arrays.stream(values()).map(Enum::name).collect(Collectors.joining(", ")));
    }
}
