package org.finstack.tubeside;

import java.util.List;
import java.util.Map;

import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The two-phase frictional pressure-gradient methods by their {@code ID} constants; the first,
 * {@link Friedel1979}, is the default. Immutable.
 */
public final class TwoPhaseFrictions {

    private static final Map<String, TwoPhaseFriction> BY_ID = Registry.index(List.of(
            Friedel1979.INSTANCE, MullerSteinhagenHeck1986.INSTANCE), TwoPhaseFriction::id);

    private TwoPhaseFrictions() {
    }

    /** @return every method, the default first */
    public static List<TwoPhaseFriction> all() {
        return List.copyOf(BY_ID.values());
    }

    /** @return the default, {@link Friedel1979} */
    public static TwoPhaseFriction standard() {
        return Friedel1979.INSTANCE;
    }

    /**
     * @param id a method's id
     * @return the method
     * @throws InputException (field {@code tubeSide.twoPhaseFriction}) for an unknown id
     */
    public static TwoPhaseFriction byId(String id) {
        TwoPhaseFriction c = id == null ? null : BY_ID.get(id);
        if (c == null) {
            throw new InputException("tubeSide.twoPhaseFriction", Msg.UNKNOWN_NAME, id,
                    String.join(", ", BY_ID.keySet()));
        }
        return c;
    }

    /** @return the ids, default first */
    public static List<String> ids() {
        return List.copyOf(BY_ID.keySet());
    }
}
