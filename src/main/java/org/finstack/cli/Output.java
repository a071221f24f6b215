package org.finstack.cli;

import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;

/** Shared pieces of the commands' output: unit-system choice, JSON envelope, aligned tables. */
final class Output {

    /** Readable names of the resistance shares, in the order a rating lists them. */
    static final Map<String, String> RESISTANCE_LABELS = Map.of(
            "airFilm", "air film", "fin", "fin conduction", "airFouling", "air-side fouling",
            "coating", "coating", "contact", "fin-collar contact", "wall", "tube wall",
            "insideFouling", "inside fouling", "insideFilm", "refrigerant film");

    private Output() {
    }

    static UnitSystem system(String text) {
        for (UnitSystem s : UnitSystem.values()) {
            if (s.name().equalsIgnoreCase(text)) {
                return s;
            }
        }
        throw new InputException("--units", Msg.UNKNOWN_NAME, text, "si, us");
    }

    static ObjectNode envelope(String command, Path input) {
        ObjectNode root = JsonNodeFactory.instance.objectNode();
        root.put("command", command);
        root.put("input", input.toString());
        return root;
    }

    static String pretty(ObjectNode root) throws com.fasterxml.jackson.core.JsonProcessingException {
        return new com.fasterxml.jackson.databind.ObjectMapper()
                .enable(com.fasterxml.jackson.databind.SerializationFeature.INDENT_OUTPUT).writeValueAsString(root);
    }

    /** A two-column table of labelled values. */
    static final class Table {
        private final PrintWriter out;
        private final UnitSystem units;

        Table(PrintWriter out, UnitSystem units) {
            this.out = out;
            this.units = units;
        }

        void section(String title) {
            out.println();
            out.println(title);
        }

        void row(String label, double si, Dimension d) {
            out.printf(Locale.ROOT, "  %-26s %s%n", label, Quantities.format(si, d, units));
        }

        void plain(String label, double v) {
            out.printf(Locale.ROOT, "  %-26s %s%n", label, Numbers.brief(v));
        }

        void percent(String label, double fraction) {
            out.printf(Locale.ROOT, "  %-26s %s %%%n", label, Numbers.brief(100 * fraction));
        }

        void share(String label, double share) {
            int bar = (int) Math.round(share * 40);
            out.printf(Locale.ROOT, "  %-26s %5.1f %%  %s%n", label, 100 * share, "#".repeat(bar));
        }
    }

    /**
     * Runs study work whose refusals name the study's parameters ({@code hours}, {@code levels}),
     * naming instead the options the user typed ({@code --hours}, {@code --levels}).
     *
     * @param <T>     what the work gives
     * @param options study parameter to the option that set it
     * @param work    the work
     * @return its result
     */
    static <T> T asOptions(Map<String, String> options, java.util.function.Supplier<T> work) {
        try {
            return work.get();
        } catch (InputException e) {
            String option = options.get(e.field());
            if (option == null) {
                throw e;
            }
            InputException named = new InputException(option, e.msg(), e.args());
            named.setStackTrace(e.getStackTrace());
            throw named;
        }
    }
}
