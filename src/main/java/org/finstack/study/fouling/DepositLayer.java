package org.finstack.study.fouling;

import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.geometry.CoilGeometry;
import org.finstack.geometry.DerivedGeometry;
import org.finstack.material.Material;

/**
 * The air-side geometry of a coil whose fins and tubes carry a uniform layer (dust or frost) of
 * thickness delta on every air-side surface. Used alike by the particulate-fouling study and the
 * frost march.
 *
 * <p><b>Construction and its approximation.</b> The fouled coil is an ordinary
 * {@link CoilGeometry} whose fin thickness is t + 2 delta (the layer on both faces), so that the
 * fin gap, the minimum free-flow area, the air-side area and the hydraulic diameter 4 Amin L / Ao
 * all follow from the narrowed passages, and the friction factor and the Kays &amp; London core
 * pressure drop see the fouled passages (the heat-transfer coefficient does not: see
 * {@link FoulingLevel}). The geometry ties the collar
 * diameter to the fin thickness (Dc = Do + 2 t), so the collar grows by 4 delta where a layer on
 * the collar would grow it by 2 delta: the tube's share of the blockage is overstated by 2 delta
 * on the diameter (for a 0.1 mm dust layer on a 13 mm collar, 1.5 % of the collar diameter).
 * The tube outer diameter, wall, inside diameter and so the whole refrigerant side are
 * untouched. The layer is not metal: the fin material of the fouled coil is given the
 * conductivity k t / (t + 2 delta) and the density rho t / (t + 2 delta), so the fin conduction
 * parameter k t, and with it the fin efficiency's m = sqrt(2 h / (k t)), and the fin mass stay
 * those of the clean metal fin; conduction along the layer itself is neglected. The layer's
 * conduction across its thickness is a separate series resistance, delta / k_layer
 * ({@link FoulingLevel#resistance()}).
 *
 * <p>Worked example: the 6 fpi plain-fin coil of the Otterby dairy cooler (fin pitch 4.233 mm,
 * fins 0.15 mm, tubes 12.7 mm at 31.75 x 27.5 mm, 4 rows) with a 0.2 mm layer has fins
 * 0.55 mm thick in the air's eyes and 21.9 % of its free-flow area blocked.
 */
public final class DepositLayer {

    /**
     * Largest share of the clean fin gap (Fp - t) the layers of two facing fins may fill together
     * before the coil is taken as blocked [-]; a limit of this program (the passages close at 1).
     */
    public static final double MAX_GAP_FILL = 0.9;

    private DepositLayer() {
    }

    /**
     * @param coil the clean coil
     * @return the thickest layer this model accepts on the coil: the layers fill
     *         {@link #MAX_GAP_FILL} of the fin gap, or bring the collars that close to the
     *         neighbouring tubes, whichever comes first [m]
     */
    public static double maxThickness(CoilGeometry coil) {
        double finGap = coil.finPitch() - coil.finThickness();
        double byFins = MAX_GAP_FILL * finGap / 2;
        double dc = coil.collarDiameter();
        double nearest = coil.rows() > 1 && coil.arrangement() == org.finstack.geometry.Arrangement.STAGGERED
                ? Math.min(coil.transversePitch(), Math.hypot(coil.transversePitch() / 2, coil.rowPitch()))
                : coil.rows() > 1 ? Math.min(coil.transversePitch(), coil.rowPitch()) : coil.transversePitch();
        double byTubes = MAX_GAP_FILL * (nearest - dc) / 4;
        double byCoating = coil.coating() == null ? Double.POSITIVE_INFINITY
                : MAX_GAP_FILL * (finGap / 2 - coil.coatingThickness()) / 2;
        return Math.min(byFins, Math.min(byTubes, byCoating));
    }

    /**
     * The coil as the air sees it with a layer on all its air-side surfaces.
     *
     * @param coil      the clean coil
     * @param thickness layer thickness on each surface [m], from 0 to {@link #maxThickness}
     * @param field     the input's name for messages
     * @return the fouled coil (the clean coil itself for a zero thickness)
     * @throws InputException naming the field if the layer would close the passages
     */
    public static CoilGeometry fouled(CoilGeometry coil, double thickness, String field) {
        Check.nonNegative(field, thickness);
        if (thickness == 0) {
            return coil;
        }
        double max = maxThickness(coil);
        if (thickness > max * (1 + 1e-12)) {
            throw new InputException(field, Msg.IMPOSSIBLE, "is " + Numbers.brief(thickness * 1e3)
                    + " mm; a layer above " + Numbers.brief(max * 1e3) + " mm closes this coil's air passages to "
                    + Numbers.brief(100 * (1 - MAX_GAP_FILL)) + " % of their clean width, beyond this model");
        }
        double t = coil.finThickness();
        double grown = t + 2 * thickness;
        Material fin = coil.finMaterial();
        double scale = t / grown;
        Material scaled = new Material(fin.id(), fin.names(), fin.uses(), fin.description(),
                fin.conductivity() * scale, fin.density() * scale, fin.source(), fin.note());
        return new CoilGeometry(coil.tubeOuterDiameter(), coil.tubeWall(), coil.tubeMaterial(), coil.arrangement(),
                coil.transversePitch(), coil.rowPitch(), coil.rows(), coil.tubesPerRow(), coil.finnedLength(),
                coil.finType(), coil.finPitch(), grown, scaled, coil.circuits(), coil.coating(),
                coil.coatingThickness(), coil.finPattern());
    }

    /**
     * @param clean  the clean coil's derived geometry
     * @param fouled the fouled coil's derived geometry
     * @return the share of the clean minimum free-flow area the layer blocks [-]
     */
    public static double blockedFraction(DerivedGeometry clean, DerivedGeometry fouled) {
        return 1 - fouled.minFlowArea() / clean.minFlowArea();
    }

    /**
     * @param coil      the clean coil
     * @param thickness layer thickness [m]
     * @return the share of the clean minimum free-flow area a layer of that thickness blocks [-]
     */
    public static double blockedFraction(CoilGeometry coil, double thickness) {
        return blockedFraction(coil.derive(), fouled(coil, thickness, "depositThickness").derive());
    }
}
