package org.finstack.fluid.blend;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Blends the trade uses that Finstack does not compute yet, with the reason. They have no
 * pseudo-pure equation of state; their properties need a multi-fluid mixture model (Kunz-Wagner
 * form: the components' equations of state combined through reducing functions and departure
 * functions with binary interaction parameters), which Finstack does not have. They are refused
 * by name rather than approximated. Compositions are the ANSI/ASHRAE Standard 34 designations
 * (mass %, from memory).
 */
public final class UnsupportedBlends {

    /** The pseudo-pure blends that are supported, named in every refusal. */
    public static final List<String> SUPPORTED = List.of("R410A", "R404A", "R407C", "R507A");

    private static final Map<String, String> REASONS = build();

    private UnsupportedBlends() {
    }

    private static Map<String, String> build() {
        String[][] blends = {
            {"R448A", "R-32/R-125/R-1234yf/R-134a/R-1234ze(E), 26/26/20/21/7 mass %"},
            {"R449A", "R-32/R-125/R-1234yf/R-134a, 24.3/24.7/25.3/25.7 mass %"},
            {"R454B", "R-32/R-1234yf, 68.9/31.1 mass %"},
            {"R513A", "R-1234yf/R-134a, 56/44 mass %"},
            {"R407F", "R-32/R-125/R-134a, 30/30/40 mass %"},
        };
        Map<String, String> m = new LinkedHashMap<>();
        for (String[] b : blends) {
            m.put(b[0], b[0] + " (" + b[1] + ") needs a multi-fluid mixture model that Finstack does not have "
                    + "yet; supported blends: " + String.join(", ", SUPPORTED));
        }
        return java.util.Collections.unmodifiableMap(m);
    }

    /** @return canonical name to reason, in a fixed order (immutable) */
    public static Map<String, String> reasons() {
        return REASONS;
    }
}
