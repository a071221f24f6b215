package org.finstack.study.pressure;

import java.util.Objects;
import org.finstack.core.Citation;

/**
 * One limit a standard places on a refrigerant charge.
 *
 * @param name      which limit, e.g. {@code "EN 378-1 room formula"}
 * @param maxCharge the largest charge it allows [kg]
 * @param basis     the formula with the numbers put in, as a sentence
 * @param source    the standard
 */
public record ChargeLimit(String name, double maxCharge, String basis, Citation source) {

    /** Validates the record. */
    public ChargeLimit {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(basis, "basis");
        Objects.requireNonNull(source, "source");
        if (!(maxCharge > 0) || !Double.isFinite(maxCharge)) {
            throw new IllegalArgumentException("charge limit " + name + " must be positive and finite");
        }
    }
}
