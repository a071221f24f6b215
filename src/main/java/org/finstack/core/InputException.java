package org.finstack.core;

/**
 * Bad input, tied to the field it came from (a dotted path as in the case file, e.g.
 * {@code coil.finPitch}). The message reads "field: reason".
 */
public class InputException extends FinstackException {

    private static final long serialVersionUID = 1L;

    private final String field;

    /**
     * @param field the field path
     * @param msg   the reason's pattern
     * @param args  its arguments
     */
    public InputException(String field, Msg msg, Object... args) {
        super(field + ": " + msg.format(args), msg, args);
        this.field = field;
    }

    /** @return the field path */
    public String field() {
        return field;
    }

    /**
     * The same error, under a longer path (e.g. {@code finPitch} becomes {@code coil.finPitch}).
     *
     * @param prefix the path to put in front
     * @return the new exception
     */
    public InputException under(String prefix) {
        InputException e = new InputException(prefix + "." + field, msg(), args());
        e.setStackTrace(getStackTrace());
        return e;
    }
}
