package org.finstack.tubeside;

import java.util.List;
import java.util.Map;

import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The void-fraction methods by their {@code ID} constants; the first, {@link Steiner1993} (the
 * horizontal-tube drift-flux form), is the default. Immutable.
 */
public final class VoidFractions {

    private static final Map<String, VoidFraction> BY_ID = Registry.index(List.of(
            Steiner1993.INSTANCE, RouhaniAxelsson1970.INSTANCE, Zivi1964.INSTANCE), VoidFraction::id);

    private VoidFractions() {
    }

    /** @return every method, the default first */
    public static List<VoidFraction> all() {
        return List.copyOf(BY_ID.values());
    }

    /** @return the default, {@link Steiner1993} */
    public static VoidFraction standard() {
        return Steiner1993.INSTANCE;
    }

    /**
     * @param id a method's id
     * @return the method
     * @throws InputException (field {@code tubeSide.voidFraction}) for an unknown id
     */
    public static VoidFraction byId(String id) {
        VoidFraction c = id == null ? null : BY_ID.get(id);
        if (c == null) {
            throw new InputException("tubeSide.voidFraction", Msg.UNKNOWN_NAME, id,
                    String.join(", ", BY_ID.keySet()));
        }
        return c;
    }

    /** @return the ids, default first */
    public static List<String> ids() {
        return List.copyOf(BY_ID.keySet());
    }
}
