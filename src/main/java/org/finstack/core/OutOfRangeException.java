package org.finstack.core;

/**
 * A request outside the range where a method or data source is valid and which Finstack
 * refuses rather than extrapolate (e.g. a fluid state beyond its equation of state's range).
 */
public class OutOfRangeException extends FinstackException {

    private static final long serialVersionUID = 1L;

    /**
     * @param msg  the pattern
     * @param args its arguments
     */
    public OutOfRangeException(Msg msg, Object... args) {
        super(msg, args);
    }
}
