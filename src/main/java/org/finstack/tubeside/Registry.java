package org.finstack.tubeside;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/** Builds the id-keyed registries, refusing duplicate ids (package-private helper). */
final class Registry {

    private Registry() {
    }

    static <T> Map<String, T> index(List<T> items, Function<T, String> id) {
        Map<String, T> m = new LinkedHashMap<>();
        for (T t : items) {
            if (m.put(id.apply(t), t) != null) {
                throw new IllegalStateException("duplicate id " + id.apply(t));
            }
        }
        return Collections.unmodifiableMap(m);
    }
}
