package org.finstack.study.pressure;

import java.util.List;
import java.util.Objects;

/**
 * The outcome of screening a refrigerant charge against room-based limits.
 *
 * @param refrigerant the refrigerant's designation
 * @param charge      the charge screened [kg]
 * @param limits      every limit evaluated
 * @param governing   the lowest of them, the one applied
 * @param within      whether the charge is at or below the governing limit
 * @param notes       thresholds and conditions met on the way, as sentences
 * @param statement   what governs beyond this screen, to be shown with every result
 */
public record ChargeScreeningResult(String refrigerant, double charge, List<ChargeLimit> limits,
        ChargeLimit governing, boolean within, List<String> notes, String statement) {

    /** Validates the record and freezes the lists. */
    public ChargeScreeningResult {
        Objects.requireNonNull(refrigerant, "refrigerant");
        Objects.requireNonNull(governing, "governing");
        Objects.requireNonNull(statement, "statement");
        limits = List.copyOf(limits);
        notes = List.copyOf(notes);
        if (!limits.contains(governing)) {
            throw new IllegalArgumentException("the governing limit must be one of the limits evaluated");
        }
    }
}
