package org.finstack.tubeside;

import java.util.List;
import java.util.Map;

import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The flow-boiling correlations by their {@code ID} constants; the first,
 * {@link GungorWinterton1987}, is the default. Immutable.
 */
public final class BoilingCorrelations {

    private static final Map<String, BoilingCorrelation> BY_ID = Registry.index(List.of(
            GungorWinterton1987.INSTANCE, Shah1982.INSTANCE, Kandlikar1990.INSTANCE), BoilingCorrelation::id);

    private BoilingCorrelations() {
    }

    /** @return every correlation, the default first */
    public static List<BoilingCorrelation> all() {
        return List.copyOf(BY_ID.values());
    }

    /** @return the default, {@link GungorWinterton1987} */
    public static BoilingCorrelation standard() {
        return GungorWinterton1987.INSTANCE;
    }

    /**
     * @param id a correlation's id
     * @return the correlation
     * @throws InputException (field {@code tubeSide.boiling}) for an unknown id
     */
    public static BoilingCorrelation byId(String id) {
        BoilingCorrelation c = id == null ? null : BY_ID.get(id);
        if (c == null) {
            throw new InputException("tubeSide.boiling", Msg.UNKNOWN_NAME, id, String.join(", ", BY_ID.keySet()));
        }
        return c;
    }

    /** @return the ids, default first */
    public static List<String> ids() {
        return List.copyOf(BY_ID.keySet());
    }
}
