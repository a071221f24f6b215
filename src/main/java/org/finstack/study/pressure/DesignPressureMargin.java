package org.finstack.study.pressure;

import java.util.List;
import java.util.Objects;

/**
 * The margin of a tube's allowable pressure over the pressure the refrigerant needs.
 *
 * @param allowableGauge allowable gauge pressure of the tube [Pa]
 * @param requiredGauge  required gauge pressure [Pa]: saturation pressure at the highest expected
 *                       condensing temperature less ambient, and not below the ASME B31.5
 *                       minimum design pressure of 105 kPa gauge
 * @param margin         allowable over required [-]
 * @param verdict        the band the margin falls in
 * @param caution        the statement of what governs, to be shown with every result
 * @param notes          how the required pressure was set, as sentences
 */
public record DesignPressureMargin(double allowableGauge, double requiredGauge, double margin, Verdict verdict,
        String caution, List<String> notes) {

    /** Validates the record and freezes the notes. */
    public DesignPressureMargin {
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(caution, "caution");
        notes = List.copyOf(notes);
        if (!(margin > 0) || !Double.isFinite(margin) || !(requiredGauge > 0)) {
            throw new IllegalArgumentException("a margin needs a positive, finite ratio and required pressure");
        }
    }

    /**
     * Bands of the margin. The bounds are Finstack's screening choice, not a code value: below
     * 1.0 the tube's calculated rating is below the required pressure; from 1.0 to 1.3 it clears
     * it by less than the allowances a service engineer should keep in hand (pressure-relief
     * accumulation above the set pressure, wall tolerance of about 10 %, a fouled or fan-failed
     * condenser running hotter than design); from 1.3 up it clears it with that room.
     */
    public enum Verdict {
        /** Margin below 1.0: the calculated rating is below the required pressure. */
        BELOW_REQUIRED,
        /** Margin from 1.0 up to 1.3: clears the required pressure with little in hand. */
        CAUTION,
        /** Margin of 1.3 or more. */
        ADEQUATE
    }
}
