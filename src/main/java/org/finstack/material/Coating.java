package org.finstack.material;

import java.util.List;
import java.util.Objects;
import org.finstack.core.Citation;

/**
 * A coating over the fins and tubes: a layer of given conductivity whose thickness the user
 * sets. Its resistance per unit air-side area is thickness / conductivity.
 *
 * @param id               canonical id, e.g. {@code epoxy}
 * @param names            accepted names (lower case), including the id
 * @param description      what it is
 * @param conductivity     thermal conductivity [W/(m K)]
 * @param typicalThickness a usual film thickness [m], used when the user gives none
 * @param source           where the values come from
 * @param note             the values as read, with any caveat
 */
public record Coating(String id, List<String> names, String description, double conductivity,
        double typicalThickness, Citation source, String note) {

    /** Validates the record. */
    public Coating {
        Objects.requireNonNull(id, "id");
        names = List.copyOf(names);
        Objects.requireNonNull(source, "source");
        if (!(conductivity > 0) || !(typicalThickness > 0)) {
            throw new IllegalArgumentException("coating " + id + ": conductivity and thickness must be positive");
        }
    }

    /**
     * @param thickness film thickness [m]
     * @return resistance per unit coated area [m2 K/W]
     */
    public double resistance(double thickness) {
        return thickness / conductivity;
    }
}
