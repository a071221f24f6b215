package org.finstack.tubeside;

import java.util.List;
import java.util.Map;

import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The condensation correlations by their {@code ID} constants; the first, {@link Shah1979}, is
 * the default. Immutable.
 */
public final class CondensationCorrelations {

    private static final Map<String, CondensationCorrelation> BY_ID = Registry.index(List.of(
            Shah1979.INSTANCE, Shah2009.INSTANCE, Cavallini2006.INSTANCE), CondensationCorrelation::id);

    private CondensationCorrelations() {
    }

    /** @return every correlation, the default first */
    public static List<CondensationCorrelation> all() {
        return List.copyOf(BY_ID.values());
    }

    /** @return the default, {@link Shah1979} */
    public static CondensationCorrelation standard() {
        return Shah1979.INSTANCE;
    }

    /**
     * @param id a correlation's id
     * @return the correlation
     * @throws InputException (field {@code tubeSide.condensation}) for an unknown id
     */
    public static CondensationCorrelation byId(String id) {
        CondensationCorrelation c = id == null ? null : BY_ID.get(id);
        if (c == null) {
            throw new InputException("tubeSide.condensation", Msg.UNKNOWN_NAME, id,
                    String.join(", ", BY_ID.keySet()));
        }
        return c;
    }

    /** @return the ids, default first */
    public static List<String> ids() {
        return List.copyOf(BY_ID.keySet());
    }
}
