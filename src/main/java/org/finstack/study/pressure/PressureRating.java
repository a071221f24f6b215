package org.finstack.study.pressure;

import java.util.List;
import java.util.Objects;
import org.finstack.core.Citation;

/**
 * The allowable working pressure of a tube, with what it rests on.
 *
 * @param materialId     material id as in {@code coil-library/materials.json}
 * @param temper         the temper whose allowable stress was used
 * @param allowableGauge allowable internal gauge pressure [Pa]
 * @param stress         maximum allowable stress S used [Pa]
 * @param method         the pressure-design rule
 * @param stressSource   where the allowable stress comes from
 * @param notes          assumptions, caveats and validity warnings, as sentences
 */
public record PressureRating(String materialId, Temper temper, double allowableGauge, double stress,
        Citation method, Citation stressSource, List<String> notes) {

    /** Validates the record and freezes the notes. */
    public PressureRating {
        Objects.requireNonNull(materialId, "materialId");
        Objects.requireNonNull(temper, "temper");
        Objects.requireNonNull(method, "method");
        Objects.requireNonNull(stressSource, "stressSource");
        notes = List.copyOf(notes);
        if (!(allowableGauge > 0) || !Double.isFinite(allowableGauge) || !(stress > 0)) {
            throw new IllegalArgumentException("a pressure rating needs a positive, finite pressure and stress");
        }
    }
}
