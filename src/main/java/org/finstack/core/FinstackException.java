package org.finstack.core;

import java.util.Arrays;

/**
 * Root of every error Finstack reports to a person. Unchecked; the message is a sentence built
 * from a {@link Msg} pattern and its arguments.
 */
public class FinstackException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final Msg msg;
    private final transient Object[] args;

    /**
     * @param msg  the pattern
     * @param args its arguments
     */
    public FinstackException(Msg msg, Object... args) {
        super(msg.format(args));
        this.msg = msg;
        this.args = args.clone();
    }

    /**
     * @param text a whole message (for wrapping messages from elsewhere)
     * @param msg  the pattern it stands under
     */
    protected FinstackException(String text, Msg msg, Object... args) {
        super(text);
        this.msg = msg;
        this.args = args.clone();
    }

    /** @return the pattern */
    public Msg msg() {
        return msg;
    }

    /** @return the pattern's arguments */
    public Object[] args() {
        return Arrays.copyOf(args, args.length);
    }
}
