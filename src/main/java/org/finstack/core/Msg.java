package org.finstack.core;

import java.text.MessageFormat;
import java.util.Locale;
import java.util.MissingResourceException;
import java.util.ResourceBundle;

/**
 * The catalogue of error messages. Each constant's text lives in
 * {@code org/finstack/core/messages.properties} under the constant's name, as a
 * {@link MessageFormat} pattern; a catalogue test checks that every constant has its text and
 * that the pattern's {n} arguments match {@link #arity()}.
 */
public enum Msg {
    /** {0} value. */
    MISSING(0),
    /** {0} value. */
    NOT_A_NUMBER(1),
    /** {0} value. */
    NOT_POSITIVE(1),
    /** {0} value. */
    NEGATIVE(1),
    /** {0} value, {1} min, {2} max. */
    OUT_OF_BOUNDS(3),
    /** {0} value, {1} limit. */
    NOT_ABOVE(2),
    /** {0} value, {1} limit. */
    NOT_BELOW(2),
    /** {0} value. */
    NOT_WHOLE(1),
    /** {0} given, {1} accepted list. */
    UNKNOWN_NAME(2),
    /** {0} text, {1} accepted units. */
    UNKNOWN_UNIT(2),
    /** {0} text. */
    MALFORMED_QUANTITY(1),
    /** {0} fin pitch, {1} fin thickness. */
    PITCH_NOT_ABOVE_THICKNESS(2),
    /** {0} fin pitch, {1} finned length. */
    PITCH_NOT_BELOW_LENGTH(2),
    /** {0} wall, {1} radius. */
    WALL_NOT_BELOW_RADIUS(2),
    /** {0} pitch, {1} collar diameter. */
    PITCH_NOT_ABOVE_COLLAR(2),
    /** {0} one key, {1} the other. */
    EXCLUSIVE(2),
    /** {0} one key, {1} the other. */
    EITHER_REQUIRED(2),
    /** {0} detail. */
    MALFORMED_FILE(1),
    /** {0} path, {1} reason. */
    FILE_UNREADABLE(2),
    /** {0} path, {1} reason. */
    FILE_UNWRITABLE(2),
    /** {0} version found, {1} newest understood. */
    NEWER_VERSION(2),
    /** {0} key. */
    UNKNOWN_KEY(1),
    /** {0} fluid, {1} property, {2} value, {3} range. */
    FLUID_OUT_OF_RANGE(4),
    /** {0} quantity, {1} iterations, {2} last residual. */
    NOT_CONVERGED(3),
    /** {0} detail. */
    IMPOSSIBLE(1),
    /** {0} duty, {1} above/below, {2} saturation temperature in C, {3} air temperature in C. */
    DUTY_DIRECTION(4),
    /** {0} fin type, {1} fin types available. */
    NO_CORRELATION(2),
    /** {0} fluid, {1} reason. */
    UNSUPPORTED_FLUID(2);

    private static final String BUNDLE = "org.finstack.core.messages";

    private final int arity;

    Msg(int arity) {
        this.arity = arity;
    }

    /** @return how many arguments the pattern takes */
    public int arity() {
        return arity;
    }

    /** @return the pattern in the default locale's bundle */
    public String pattern() {
        try {
            return ResourceBundle.getBundle(BUNDLE, Locale.ROOT).getString(name());
        } catch (MissingResourceException e) {
            return name() + " {0} {1} {2} {3}";
        }
    }

    /**
     * @param args the pattern's arguments; doubles are shown briefly
     * @return the message text
     */
    public String format(Object... args) {
        Object[] shown = new Object[args.length];
        for (int i = 0; i < args.length; i++) {
            shown[i] = args[i] instanceof Double d ? Numbers.brief(d) : String.valueOf(args[i]);
        }
        MessageFormat f = new MessageFormat(pattern().replace("'", "''"), Locale.ROOT);
        return f.format(shown);
    }
}
