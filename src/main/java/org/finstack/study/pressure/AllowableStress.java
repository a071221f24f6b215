package org.finstack.study.pressure;

import java.util.Objects;
import org.finstack.core.Citation;

/**
 * The maximum allowable stress of a tube material at one design temperature, with where it
 * comes from.
 *
 * @param materialId        material id as in {@code coil-library/materials.json}
 * @param specification     the tube product specification the value belongs to
 * @param temper            the temper whose value was used
 * @param stress            maximum allowable stress in tension S [Pa]
 * @param designTemperature the temperature it applies at [K]
 * @param source            where the value comes from
 * @param note              the value as read or recalled, with any caveat
 */
public record AllowableStress(String materialId, String specification, Temper temper, double stress,
        double designTemperature, Citation source, String note) {

    /** Validates the record. */
    public AllowableStress {
        Objects.requireNonNull(materialId, "materialId");
        Objects.requireNonNull(specification, "specification");
        Objects.requireNonNull(temper, "temper");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(note, "note");
        if (!(stress > 0) || !(designTemperature > 0)) {
            throw new IllegalArgumentException("allowable stress of " + materialId + ": stress and temperature must be positive");
        }
    }
}
