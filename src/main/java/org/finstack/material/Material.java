package org.finstack.material;

import java.util.List;
import java.util.Objects;
import java.util.Set;
import org.finstack.core.Citation;

/**
 * A solid used for tubes or fins.
 *
 * @param id           canonical id, e.g. {@code copper}
 * @param names        accepted names (lower case), including the id
 * @param uses         where it may be used: {@code tube}, {@code fin}
 * @param description  what it is, in a practitioner's words
 * @param conductivity thermal conductivity [W/(m K)]
 * @param density      density [kg/m3]
 * @param source       where the values come from
 * @param note         the values as read from the source, with any caveat
 */
public record Material(String id, List<String> names, Set<String> uses, String description,
        double conductivity, double density, Citation source, String note) {

    /** Validates the record. */
    public Material {
        Objects.requireNonNull(id, "id");
        names = List.copyOf(names);
        uses = Set.copyOf(uses);
        Objects.requireNonNull(source, "source");
        if (!(conductivity > 0) || !(density > 0)) {
            throw new IllegalArgumentException("material " + id + ": conductivity and density must be positive");
        }
    }

    /** @return whether the material may be used for tubes */
    public boolean forTubes() {
        return uses.contains("tube");
    }

    /** @return whether the material may be used for fins */
    public boolean forFins() {
        return uses.contains("fin");
    }
}
