package org.finstack.study.pressure;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.core.Warnings;
import org.finstack.material.Material;
import org.finstack.material.Materials;

/**
 * Allowable working pressure of a coil's round tube from its material, outside diameter, wall
 * and design temperature: the ASME B31 straight-pipe rule ({@link AsmeB31StraightPipe}) with the
 * allowable stress of {@link AllowableStressTable}.
 *
 * <p>Material ids are those of {@code coil-library/materials.json} (aliases accepted): copper,
 * copper-etp, aluminium-3003, cupronickel-90-10, stainless-304, carbon-steel. Fin-only materials
 * (aluminium fin stock) and unknown names are refused on field {@code coil.tubeMaterial}.
 *
 * <p>The short form takes the tube as annealed, seamless and without corrosion allowance: coil
 * return bends are brazed, which anneals copper next to the joints, so the handbook requires the
 * annealed rating (Copper Development Association, The Copper Tube Handbook, Table 3c footnote,
 * read); coil tube is commonly bought soft for bending and expansion (common practice).
 *
 * <p>Worked example (as {@link AsmeB31StraightPipe}): copper, 9.525 mm x 0.762 mm, 310.93 K
 * (100 F): S = 41.369 MPa, allowable gauge pressure 7.0715 MPa (1025.6 psi).
 */
public final class TubePressureRating {

    private static final String MATERIAL = "coil.tubeMaterial";

    private TubePressureRating() {
    }

    /**
     * Allowable pressure of a seamless, annealed tube without corrosion allowance.
     *
     * @param materialId        tube material id or alias
     * @param outsideDiameter   outside diameter [m]
     * @param wall              wall thickness [m] (the minimum wall for a code-basis rating)
     * @param designTemperature design metal temperature [K]
     * @return the rating
     * @throws InputException naming the offending field
     */
    public static PressureRating allowablePressure(String materialId, double outsideDiameter, double wall,
            double designTemperature) {
        return allowablePressure(materialId, Temper.ANNEALED, outsideDiameter, wall, designTemperature, 0, 1);
    }

    /**
     * Allowable pressure with every assumption stated.
     *
     * @param materialId         tube material id or alias
     * @param temper             tube temper (annealed for any brazed or welded tube)
     * @param outsideDiameter    outside diameter [m]
     * @param wall               wall thickness [m]
     * @param designTemperature  design metal temperature [K]
     * @param corrosionAllowance corrosion allowance deducted from the wall [m]
     * @param jointFactor        longitudinal joint factor [-]: 1 for seamless tube
     * @return the rating
     * @throws InputException naming the offending field
     */
    public static PressureRating allowablePressure(String materialId, Temper temper, double outsideDiameter,
            double wall, double designTemperature, double corrosionAllowance, double jointFactor) {
        Material m = Materials.library().tube(MATERIAL, materialId);
        AllowableStressTable table = AllowableStressTable.standard();
        if (!table.covers(m.id())) {
            throw new InputException(MATERIAL, Msg.UNKNOWN_NAME, materialId, String.join(", ", table.materialIds()));
        }
        if (temper == null) {
            throw new InputException("temper", Msg.MISSING);
        }
        Check.positive("coil.tubeOuterDiameter", outsideDiameter);
        Check.positive("coil.tubeWall", wall);
        if (wall >= outsideDiameter / 2) {
            throw new InputException("coil.tubeWall", Msg.WALL_NOT_BELOW_RADIUS, wall, outsideDiameter / 2);
        }
        AllowableStress s = table.stress(m.id(), temper, designTemperature);
        Warnings w = new Warnings();
        double p = AsmeB31StraightPipe.allowablePressure(s.stress(), jointFactor, outsideDiameter, wall,
                corrosionAllowance, w);
        List<String> notes = new ArrayList<>();
        if (s.temper() == Temper.ANNEALED) {
            notes.add("Annealed-temper stress used: coil return bends are brazed and brazing anneals the tube "
                    + "next to the joints (Copper Development Association, Copper Tube Handbook, Table 3c "
                    + "footnote).");
        } else {
            notes.add("Drawn-temper stress used: valid only where no brazing or welding has annealed the tube.");
        }
        notes.add(String.format(Locale.ROOT, "Allowable stress %s MPa for %s: %s (%s).",
                Numbers.brief(s.stress() / 1e6), s.specification(), s.note(), s.source().key()));
        notes.add("The code rule takes the minimum wall and maximum diameter; nominal dimensions give a rating "
                + "higher by about the wall tolerance (about 10 % for ASTM copper tube).");
        notes.add("The calculated rating underestimates the tested strength of thin-wall coil tube (Copper Tube "
                + "Handbook, 'Pressure Ratings and Burst Strength'); the coil maker's rated design pressure, "
                + "from its pressure and burst tests, governs.");
        if (corrosionAllowance == 0 && !m.id().startsWith("copper") && !m.id().startsWith("cupronickel")) {
            notes.add("No corrosion allowance was deducted from the wall.");
        }
        if (jointFactor < 1) {
            notes.add("Longitudinal joint factor " + Numbers.brief(jointFactor) + " applied (welded tube).");
        }
        notes.addAll(w.list());
        return new PressureRating(m.id(), s.temper(), p, s.stress(), AsmeB31StraightPipe.SOURCE, s.source(), notes);
    }
}
