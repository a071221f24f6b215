package org.finstack.coil;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The thermal resistances in series between the air and the refrigerant, each in [K/W] for the
 * whole coil. The air side is split into the film as if the fins were perfect (1/(h A_o)) and
 * the extra resistance the fins' finite efficiency adds (1/(eta_o h A_o) - 1/(h A_o)).
 *
 * @param airFilm       air film on a perfect surface [K/W]
 * @param fin           conduction along the fins (from their efficiency) [K/W]
 * @param airFouling    air-side fouling, R/(eta_o A_o) [K/W]
 * @param coating       coating film, R/(eta_o A_o) [K/W]
 * @param contact       fin-collar contact, R/(pi D_o L) [K/W]
 * @param wall          tube wall conduction, ln(Do/Di)/(2 pi k L) [K/W]
 * @param insideFouling inside fouling, R/A_i [K/W]
 * @param insideFilm    refrigerant film, 1/(h_i A_i) [K/W]
 */
public record Resistances(double airFilm, double fin, double airFouling, double coating, double contact,
        double wall, double insideFouling, double insideFilm) {

    /** @return the sum, 1/UA [K/W] */
    public double total() {
        return airFilm + fin + airFouling + coating + contact + wall + insideFouling + insideFilm;
    }

    /** @return each resistance's share of the total, in a fixed order, summing to one */
    public Map<String, Double> shares() {
        double t = total();
        Map<String, Double> m = new LinkedHashMap<>();
        m.put("airFilm", airFilm / t);
        m.put("fin", fin / t);
        m.put("airFouling", airFouling / t);
        m.put("coating", coating / t);
        m.put("contact", contact / t);
        m.put("wall", wall / t);
        m.put("insideFouling", insideFouling / t);
        m.put("insideFilm", insideFilm / t);
        return m;
    }
}
