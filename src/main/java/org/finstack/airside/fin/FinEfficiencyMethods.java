package org.finstack.airside.fin;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/** The fin-efficiency methods Finstack offers, looked up by their identifiers. */
public final class FinEfficiencyMethods {

    private static final List<FinEfficiencyMethod> ALL = List.of(
            SchmidtFinEfficiency.INSTANCE,
            AnnularFinEfficiency.INSTANCE);

    private static final Map<String, FinEfficiencyMethod> BY_ID = index();

    private FinEfficiencyMethods() {
    }

    private static Map<String, FinEfficiencyMethod> index() {
        Map<String, FinEfficiencyMethod> m = new LinkedHashMap<>();
        for (FinEfficiencyMethod f : ALL) {
            if (m.put(f.id(), f) != null) {
                throw new IllegalStateException("duplicate fin efficiency method id " + f.id());
            }
        }
        return Map.copyOf(m);
    }

    /** @return every method, in a fixed order (the default first) */
    public static List<FinEfficiencyMethod> all() {
        return ALL;
    }

    /**
     * @param id a method identifier, e.g. {@value SchmidtFinEfficiency#ID}
     * @return the method
     * @throws InputException (field {@code finEfficiencyMethod}) for an unknown identifier,
     *                        listing the accepted ones
     */
    public static FinEfficiencyMethod byId(String id) {
        FinEfficiencyMethod f = id == null ? null : BY_ID.get(id);
        if (f == null) {
            throw new InputException("finEfficiencyMethod", Msg.UNKNOWN_NAME, id,
                    String.join(", ", ids()));
        }
        return f;
    }

    /** @return the identifiers, in the order of {@link #all()} */
    public static List<String> ids() {
        return ALL.stream().map(FinEfficiencyMethod::id).toList();
    }
}
