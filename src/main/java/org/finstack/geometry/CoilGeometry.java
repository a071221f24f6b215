package org.finstack.geometry;

import java.util.Objects;
import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.material.Coating;
import org.finstack.material.Material;

/**
 * An immutable description of a plate-fin-and-tube coil, as a person measures it. All lengths in
 * metres. The fin collar wraps the tube, so the collar diameter (the "tube diameter" of many
 * textbook surfaces) is the tube outer diameter plus two fin thicknesses; this record keeps the
 * two apart.
 *
 * <p>Validation names each field as the case file does (the case reader prefixes {@code coil.}).
 *
 * @param tubeOuterDiameter tube outside diameter, before expansion into the fins [m]
 * @param tubeWall          tube wall thickness [m]
 * @param tubeMaterial      tube material
 * @param arrangement       staggered or inline rows
 * @param transversePitch   tube centre spacing within a row, across the air flow [m]
 * @param rowPitch          spacing of successive rows, along the air flow [m]
 * @param rows              number of tube rows in the air direction
 * @param tubesPerRow       tubes in each row (sets the face height)
 * @param finnedLength      finned length of each tube (the face width) [m]
 * @param finType           fin type id ({@code plain}, {@code wavy}, {@code louvered}, ...)
 * @param finPitch          fin spacing centre to centre [m] (1 / fin density)
 * @param finThickness      fin thickness [m]
 * @param finMaterial       fin material
 * @param circuits          number of refrigerant circuits
 * @param coating           coating over the air-side surface, or {@code null} for none
 * @param coatingThickness  coating film thickness [m] (zero without a coating)
 */
public record CoilGeometry(double tubeOuterDiameter, double tubeWall, Material tubeMaterial,
        Arrangement arrangement, double transversePitch, double rowPitch, int rows, int tubesPerRow,
        double finnedLength, String finType, double finPitch, double finThickness,
        Material finMaterial, int circuits, Coating coating, double coatingThickness) {

    /** Validates the geometry; impossible coils are refused naming the field and the limit. */
    public CoilGeometry {
        Check.positive("tubeOuterDiameter", tubeOuterDiameter);
        Check.positive("tubeWall", tubeWall);
        if (tubeWall >= tubeOuterDiameter / 2) {
            throw new InputException("tubeWall", Msg.WALL_NOT_BELOW_RADIUS, tubeWall, tubeOuterDiameter / 2);
        }
        Objects.requireNonNull(tubeMaterial, "tubeMaterial");
        Objects.requireNonNull(arrangement, "arrangement");
        Check.positive("transversePitch", transversePitch);
        Check.positive("rowPitch", rowPitch);
        Check.atLeastOne("rows", rows);
        Check.atLeastOne("tubesPerRow", tubesPerRow);
        Check.positive("finnedLength", finnedLength);
        Objects.requireNonNull(finType, "finType");
        Check.positive("finPitch", finPitch);
        Check.positive("finThickness", finThickness);
        if (finPitch <= finThickness) {
            throw new InputException("finPitch", Msg.PITCH_NOT_ABOVE_THICKNESS, finPitch, finThickness);
        }
        Objects.requireNonNull(finMaterial, "finMaterial");
        Check.atLeastOne("circuits", circuits);
        if (circuits > rows * tubesPerRow) {
            throw new InputException("circuits", Msg.NOT_BELOW, (double) circuits, (double) (rows * tubesPerRow + 1));
        }
        double dc = tubeOuterDiameter + 2 * finThickness;
        if (transversePitch <= dc) {
            throw new InputException("transversePitch", Msg.PITCH_NOT_ABOVE_COLLAR, transversePitch, dc);
        }
        double nearest = arrangement == Arrangement.STAGGERED
                ? Math.hypot(transversePitch / 2, rowPitch) : rowPitch;
        if (rows > 1 && nearest <= dc) {
            throw new InputException("rowPitch", Msg.PITCH_NOT_ABOVE_COLLAR, nearest, dc);
        }
        if (coating == null) {
            if (coatingThickness != 0) {
                throw new InputException("coatingThickness", Msg.EITHER_REQUIRED, "coating", "no coatingThickness");
            }
        } else {
            Check.positive("coatingThickness", coatingThickness);
            if (coatingThickness >= (finPitch - finThickness) / 2) {
                throw new InputException("coatingThickness", Msg.NOT_BELOW, coatingThickness,
                        (finPitch - finThickness) / 2);
            }
        }
    }

    /** @return collar (fin-root) diameter: tube outer diameter plus two fin thicknesses [m] */
    public double collarDiameter() {
        return tubeOuterDiameter + 2 * finThickness;
    }

    /** @return tube inside diameter [m] */
    public double insideDiameter() {
        return tubeOuterDiameter - 2 * tubeWall;
    }

    /** @return total number of tubes */
    public int tubes() {
        return rows * tubesPerRow;
    }

    /** @return fin density [fins per metre] */
    public double finDensity() {
        return 1 / finPitch;
    }

    /** @return everything that follows from this description (computed each call; keep the result) */
    public DerivedGeometry derive() {
        return DerivedGeometry.of(this);
    }

    /**
     * @param pitch new fin pitch [m]
     * @return this coil with another fin pitch
     */
    public CoilGeometry withFinPitch(double pitch) {
        return new CoilGeometry(tubeOuterDiameter, tubeWall, tubeMaterial, arrangement, transversePitch, rowPitch,
                rows, tubesPerRow, finnedLength, finType, pitch, finThickness, finMaterial, circuits,
                coating, coatingThickness);
    }

    /**
     * @param n new number of rows
     * @return this coil with another number of rows
     */
    public CoilGeometry withRows(int n) {
        return new CoilGeometry(tubeOuterDiameter, tubeWall, tubeMaterial, arrangement, transversePitch, rowPitch,
                n, tubesPerRow, finnedLength, finType, finPitch, finThickness, finMaterial, circuits,
                coating, coatingThickness);
    }

    /**
     * @param length new finned length [m]
     * @return this coil with another finned length
     */
    public CoilGeometry withFinnedLength(double length) {
        return new CoilGeometry(tubeOuterDiameter, tubeWall, tubeMaterial, arrangement, transversePitch, rowPitch,
                rows, tubesPerRow, length, finType, finPitch, finThickness, finMaterial, circuits,
                coating, coatingThickness);
    }

    /**
     * @param wall new tube wall [m]
     * @return this coil with another tube wall
     */
    public CoilGeometry withTubeWall(double wall) {
        return new CoilGeometry(tubeOuterDiameter, wall, tubeMaterial, arrangement, transversePitch, rowPitch,
                rows, tubesPerRow, finnedLength, finType, finPitch, finThickness, finMaterial, circuits,
                coating, coatingThickness);
    }

    /**
     * @param material new tube material
     * @return this coil with another tube material
     */
    public CoilGeometry withTubeMaterial(Material material) {
        return new CoilGeometry(tubeOuterDiameter, tubeWall, material, arrangement, transversePitch, rowPitch,
                rows, tubesPerRow, finnedLength, finType, finPitch, finThickness, finMaterial, circuits,
                coating, coatingThickness);
    }

    /**
     * @param thickness new fin thickness [m]
     * @return this coil with another fin thickness
     */
    public CoilGeometry withFinThickness(double thickness) {
        return new CoilGeometry(tubeOuterDiameter, tubeWall, tubeMaterial, arrangement, transversePitch, rowPitch,
                rows, tubesPerRow, finnedLength, finType, finPitch, thickness, finMaterial, circuits,
                coating, coatingThickness);
    }
}
