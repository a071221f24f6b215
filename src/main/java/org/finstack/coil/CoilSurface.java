package org.finstack.coil;

import org.finstack.airside.fin.FinEfficiencyMethod;
import org.finstack.airside.fin.PlateFinCell;
import org.finstack.airside.fin.SurfaceEffectiveness;
import org.finstack.core.Warnings;
import org.finstack.geometry.Arrangement;
import org.finstack.geometry.CoilGeometry;
import org.finstack.geometry.DerivedGeometry;

/**
 * The heat-transfer surfaces of a whole coil at one airflow: the air-side coefficient, the fins,
 * and every series resistance except the refrigerant film. A part of the coil (a zone, a tube
 * segment) is a fraction of these surfaces: all areas, and so all conductances, scale with it.
 *
 * <p>Wet surfaces follow the enthalpy-potential treatment of Threlkeld (1970) as cast in
 * effectiveness form by Braun, Klein &amp; Mitchell (1989): the air-side driving force is the
 * difference of moist-air enthalpies, the air film's conductance becomes h_o / cp_a, and the
 * metal and refrigerant-side resistances are multiplied by b, the slope of the saturated-air
 * enthalpy against temperature; the wet fin efficiency uses h_o b_w / cp_a in place of h_o.
 *
 * @param coil           the coil
 * @param derived        its derived geometry
 * @param fouling        added resistances
 * @param airCoefficient dry air-side coefficient h_o [W/(m2 K)]
 * @param fin            the fin-efficiency method
 * @param cell           the fin cell
 * @param finBound       the method bound to this cell and fin material
 */
public record CoilSurface(CoilGeometry coil, DerivedGeometry derived, FoulingResistances fouling,
        double airCoefficient, FinEfficiencyMethod fin, PlateFinCell cell, FinEfficiencyMethod.Bound finBound) {

    /**
     * @param coil           the coil
     * @param fouling        added resistances
     * @param airCoefficient dry air-side coefficient [W/(m2 K)]
     * @param fin            fin-efficiency method
     * @return the surface description
     */
    public static CoilSurface of(CoilGeometry coil, FoulingResistances fouling, double airCoefficient,
            FinEfficiencyMethod fin) {
        DerivedGeometry d = coil.derive();
        PlateFinCell cell = new PlateFinCell(d.collarDiameter(), coil.finThickness(), coil.transversePitch(),
                coil.rowPitch(), coil.arrangement() == Arrangement.STAGGERED);
        return new CoilSurface(coil, d, fouling, airCoefficient, fin, cell,
                fin.bind(cell, coil.finMaterial().conductivity()));
    }

    /**
     * Fin efficiency for an effective film coefficient.
     *
     * @param h effective coefficient [W/(m2 K)] (h_o dry; h_o b_w / cp_a wet)
     * @param w warnings
     * @return eta_f [-]
     */
    public double finEfficiency(double h, Warnings w) {
        return finBound.efficiency(h, w);
    }

    /**
     * @param h effective coefficient [W/(m2 K)]
     * @param w warnings
     * @return surface effectiveness eta_o [-]
     */
    public double surfaceEffectiveness(double h, Warnings w) {
        return SurfaceEffectiveness.of(finEfficiency(h, w), derived.finArea(), derived.airSideArea());
    }

    /**
     * The whole coil's dry resistances with a given refrigerant film coefficient.
     *
     * @param insideCoefficient refrigerant film coefficient [W/(m2 K)]
     * @param w                 warnings
     * @return the resistances [K/W]
     */
    public Resistances dryResistances(double insideCoefficient, Warnings w) {
        double ao = derived.airSideArea();
        double etaO = surfaceEffectiveness(airCoefficient, w);
        double perfect = 1 / (airCoefficient * ao);
        double coating = coil.coating() == null ? 0 : coil.coating().resistance(coil.coatingThickness()) / (etaO * ao);
        return new Resistances(perfect, perfect / etaO - perfect, fouling.airSide() / (etaO * ao), coating,
                fouling.contact() / derived.tubeOuterArea(), wallResistance(), fouling.inside() / derived.insideArea(),
                1 / (insideCoefficient * derived.insideArea()));
    }

    /** @return tube-wall conduction resistance of the whole coil, ln(Do/Di)/(2 pi k L) [K/W] */
    public double wallResistance() {
        return Math.log(coil.tubeOuterDiameter() / coil.insideDiameter())
                / (2 * Math.PI * coil.tubeMaterial().conductivity() * derived.totalTubeLength());
    }

    /**
     * Resistance from the tube's outer surface to the refrigerant, whole coil: contact, wall,
     * inside fouling and refrigerant film.
     *
     * @param insideCoefficient refrigerant film coefficient [W/(m2 K)]
     * @return [K/W]
     */
    public double metalAndInside(double insideCoefficient) {
        return fouling.contact() / derived.tubeOuterArea() + wallResistance() + fouling.inside() / derived.insideArea()
                + 1 / (insideCoefficient * derived.insideArea());
    }

    /**
     * Air-side resistance of the whole coil in sensible-heat terms (film, fins, fouling, coating).
     *
     * @param etaO surface effectiveness
     * @return [K/W]
     */
    public double airSide(double etaO) {
        double ao = derived.airSideArea();
        double coating = coil.coating() == null ? 0 : coil.coating().resistance(coil.coatingThickness());
        return (1 / airCoefficient + fouling.airSide() + coating) / (etaO * ao);
    }
}
