package org.finstack.core;

import java.util.Objects;

/**
 * A published source: a short key (authors and year, as a reader would say it) and the full
 * reference. Every method class and every data record from outside the code carries one.
 *
 * @param key       short form, e.g. {@code "Wang, Chi & Chang 2000"}
 * @param reference full bibliographic entry
 */
public record Citation(String key, String reference) {

    /** Validates that both parts are present. */
    public Citation {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(reference, "reference");
        if (key.isBlank() || reference.isBlank()) {
            throw new IllegalArgumentException("a citation needs a key and a reference");
        }
    }

    /**
     * @param key       short form
     * @param reference full entry
     * @return the citation
     */
    public static Citation of(String key, String reference) {
        return new Citation(key, reference);
    }

    @Override
    public String toString() {
        return key + ": " + reference;
    }
}
