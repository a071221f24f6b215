package org.finstack.exchanger;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * A flow arrangement of a two-stream heat exchanger, selectable by a stable id string (as written
 * in case files): either one of the fixed {@link FlowArrangement}s or a multi-row
 * {@link CounterCrossflow}.
 */
public sealed interface Arrangement permits FlowArrangement, CounterCrossflow {

    /** @return the stable id, e.g. {@code "counterflow"} or {@code "counter-crossflow-3-rows-air-cmin"} */
    String id();

    /** @return the published source of the arrangement's effectiveness relation */
    Citation source();

    /** @return a one-line description for people */
    String description();

    /**
     * Finds an arrangement by its id (case and surrounding blanks ignored).
     *
     * @param id the id, e.g. {@code "crossflow-cmax-mixed"} or {@code "counter-crossflow-4-rows-air-cmax"}
     * @return the arrangement
     * @throws InputException (field {@code arrangement}) if the id is missing or unknown
     */
    static Arrangement of(String id) {
        if (id == null || id.isBlank()) {
            throw new InputException("arrangement", Msg.MISSING);
        }
        String key = id.strip().toLowerCase(Locale.ROOT);
        for (FlowArrangement f : FlowArrangement.values()) {
            if (f.id().equals(key)) {
                return f;
            }
        }
        Matcher m = CounterCrossflow.ID.matcher(key);
        if (m.matches()) {
            int rows;
            try {
                rows = Integer.parseInt(m.group(1));
            } catch (NumberFormatException e) {
                throw new InputException("arrangement", Msg.UNKNOWN_NAME, id, String.join(", ", ids()));
            }
            return CounterCrossflow.rows(rows, m.group(2).equals("cmin"));
        }
        throw new InputException("arrangement", Msg.UNKNOWN_NAME, id, String.join(", ", ids()));
    }

    /** @return the accepted ids, the multi-row form written with {@code <n>} for the number of rows */
    static List<String> ids() {
        List<String> ids = new ArrayList<>();
        for (FlowArrangement f : FlowArrangement.values()) {
            ids.add(f.id());
        }
        ids.add("counter-crossflow-<n>-rows-air-cmin");
        ids.add("counter-crossflow-<n>-rows-air-cmax");
        return List.copyOf(ids);
    }
}
