package org.finstack.core;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Collects warnings during one calculation. Local to that calculation (never shared between
 * threads); the same text is kept once, in the order first raised.
 */
public final class Warnings {

    private final Set<String> items = new LinkedHashSet<>();
    private final boolean keep;

    /** A collector that keeps what it is given. */
    public Warnings() {
        this(true);
    }

    private Warnings(boolean keep) {
        this.keep = keep;
    }

    /** @param warning a sentence that names what is questionable and why */
    public void add(String warning) {
        if (keep) {
            items.add(warning);
        }
    }

    /**
     * @return whether this collector keeps what it is given (a discarding one lets callers skip
     *         composing the text)
     */
    public boolean keeps() {
        return keep;
    }

    /** @param other warnings to take over */
    public void addAll(Warnings other) {
        if (!keep) {
            return;
        }
        items.addAll(other.items);
    }

    /** @return whether nothing was raised */
    public boolean isEmpty() {
        return items.isEmpty();
    }

    /** @return the warnings, in the order first raised */
    public List<String> list() {
        return Collections.unmodifiableList(new ArrayList<>(items));
    }

    /** @return a warnings collector that drops everything (for inner iterations) */
    public static Warnings discard() {
        // used inside solver iterations, whose warnings are raised again on the converged state;
        // one shared instance, which nothing ever changes
        return DISCARD;
    }

    private static final Warnings DISCARD = new Warnings(false);

    @Override
    public String toString() {
        return items.toString();
    }
}
