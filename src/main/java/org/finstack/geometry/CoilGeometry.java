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
 * @param finPattern        the fin-pattern parameters a wavy or louvered fin needs
 *                          ({@link FinPattern#NONE} for a plain fin; {@code null} is taken as
 *                          {@code NONE})
 */
public record CoilGeometry(double tubeOuterDiameter, double tubeWall, Material tubeMaterial,
        Arrangement arrangement, double transversePitch, double rowPitch, int rows, int tubesPerRow,
        double finnedLength, String finType, double finPitch, double finThickness,
        Material finMaterial, int circuits, Coating coating, double coatingThickness, FinPattern finPattern) {

    /** Fin type whose fins carry a herringbone wave ({@link FinPattern#waveHeight}, {@link FinPattern#waveLength}). */
    public static final String WAVY = "wavy";
    /** Fin type whose fins carry louvers ({@link FinPattern#louverPitch}, {@link FinPattern#louverHeight}). */
    public static final String LOUVERED = "louvered";

    /**
     * A coil without fin-pattern parameters (plain fins, or a fin type that needs none).
     *
     * @param tubeOuterDiameter tube outside diameter [m]
     * @param tubeWall          tube wall thickness [m]
     * @param tubeMaterial      tube material
     * @param arrangement       staggered or inline rows
     * @param transversePitch   transverse tube pitch [m]
     * @param rowPitch          row pitch [m]
     * @param rows              rows in the air direction
     * @param tubesPerRow       tubes in each row
     * @param finnedLength      finned length of each tube [m]
     * @param finType           fin type id
     * @param finPitch          fin pitch [m]
     * @param finThickness      fin thickness [m]
     * @param finMaterial       fin material
     * @param circuits          refrigerant circuits
     * @param coating           coating, or {@code null}
     * @param coatingThickness  coating thickness [m]
     */
    public CoilGeometry(double tubeOuterDiameter, double tubeWall, Material tubeMaterial,
            Arrangement arrangement, double transversePitch, double rowPitch, int rows, int tubesPerRow,
            double finnedLength, String finType, double finPitch, double finThickness,
            Material finMaterial, int circuits, Coating coating, double coatingThickness) {
        this(tubeOuterDiameter, tubeWall, tubeMaterial, arrangement, transversePitch, rowPitch, rows, tubesPerRow,
                finnedLength, finType, finPitch, finThickness, finMaterial, circuits, coating, coatingThickness,
                FinPattern.NONE);
    }

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
        if (finPitch >= finnedLength) {
            throw new InputException("finPitch", Msg.PITCH_NOT_BELOW_LENGTH, finPitch, finnedLength);
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
        if (finPattern == null) {
            finPattern = FinPattern.NONE;
        }
        finPattern.checkFor(finType, rowPitch);
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
                coating, coatingThickness, finPattern);
    }

    /**
     * @param n new number of rows
     * @return this coil with another number of rows
     */
    public CoilGeometry withRows(int n) {
        return new CoilGeometry(tubeOuterDiameter, tubeWall, tubeMaterial, arrangement, transversePitch, rowPitch,
                n, tubesPerRow, finnedLength, finType, finPitch, finThickness, finMaterial, circuits,
                coating, coatingThickness, finPattern);
    }

    /**
     * @param length new finned length [m]
     * @return this coil with another finned length
     */
    public CoilGeometry withFinnedLength(double length) {
        return new CoilGeometry(tubeOuterDiameter, tubeWall, tubeMaterial, arrangement, transversePitch, rowPitch,
                rows, tubesPerRow, length, finType, finPitch, finThickness, finMaterial, circuits,
                coating, coatingThickness, finPattern);
    }

    /**
     * @param wall new tube wall [m]
     * @return this coil with another tube wall
     */
    public CoilGeometry withTubeWall(double wall) {
        return new CoilGeometry(tubeOuterDiameter, wall, tubeMaterial, arrangement, transversePitch, rowPitch,
                rows, tubesPerRow, finnedLength, finType, finPitch, finThickness, finMaterial, circuits,
                coating, coatingThickness, finPattern);
    }

    /**
     * @param material new tube material
     * @return this coil with another tube material
     */
    public CoilGeometry withTubeMaterial(Material material) {
        return new CoilGeometry(tubeOuterDiameter, tubeWall, material, arrangement, transversePitch, rowPitch,
                rows, tubesPerRow, finnedLength, finType, finPitch, finThickness, finMaterial, circuits,
                coating, coatingThickness, finPattern);
    }

    /**
     * @param type    new fin type id
     * @param pattern its fin-pattern parameters ({@link FinPattern#NONE} for none)
     * @return this coil with another fin type
     */
    public CoilGeometry withFinPattern(String type, FinPattern pattern) {
        return new CoilGeometry(tubeOuterDiameter, tubeWall, tubeMaterial, arrangement, transversePitch, rowPitch,
                rows, tubesPerRow, finnedLength, type, finPitch, finThickness, finMaterial, circuits,
                coating, coatingThickness, pattern);
    }

    /**
     * @param thickness new fin thickness [m]
     * @return this coil with another fin thickness
     */
    public CoilGeometry withFinThickness(double thickness) {
        return new CoilGeometry(tubeOuterDiameter, tubeWall, tubeMaterial, arrangement, transversePitch, rowPitch,
                rows, tubesPerRow, finnedLength, finType, finPitch, thickness, finMaterial, circuits,
                coating, coatingThickness, finPattern);
    }

    /**
     * The fin-pattern parameters of an enhanced fin, as measured on the fin; zero means "not
     * given". A wavy (herringbone) fin needs the wave height and length, a louvered fin the
     * louver pitch and height; a plain fin needs none. Which fin type a coil has is
     * {@link CoilGeometry#finType()}; its constructor refuses a missing parameter of that type,
     * and a parameter that belongs to another type, naming the field.
     *
     * @param waveHeight   Pd, wave height of a herringbone wavy fin, peak to valley, not counting
     *                     the fin thickness [m]
     * @param waveLength   Xf, the projected length of <em>half</em> a wave, measured in the air-flow
     *                     direction (the wave "length" of the Wang et al. wavy-fin papers, so that
     *                     tan(theta) = Pd / Xf is the corrugation angle) [m]
     * @param louverPitch  Lp, louver pitch, measured in the air-flow direction [m]
     * @param louverHeight Lh, louver height, the height of the louver opening normal to the fin [m]
     */
    public record FinPattern(double waveHeight, double waveLength, double louverPitch, double louverHeight) {

        /** No fin-pattern parameters. */
        public static final FinPattern NONE = new FinPattern(0, 0, 0, 0);

        /** Validates each value: finite and not negative (zero = not given). */
        public FinPattern {
            Check.nonNegative("waveHeight", waveHeight);
            Check.nonNegative("waveLength", waveLength);
            Check.nonNegative("louverPitch", louverPitch);
            Check.nonNegative("louverHeight", louverHeight);
        }

        /**
         * @param waveHeight Pd [m]
         * @param waveLength Xf, projected half-wave length [m]
         * @return a wavy-fin pattern
         */
        public static FinPattern wavy(double waveHeight, double waveLength) {
            return new FinPattern(waveHeight, waveLength, 0, 0);
        }

        /**
         * @param louverPitch  Lp [m]
         * @param louverHeight Lh [m]
         * @return a louvered-fin pattern
         */
        public static FinPattern louvered(double louverPitch, double louverHeight) {
            return new FinPattern(0, 0, louverPitch, louverHeight);
        }

        /**
         * Refuses a parameter the fin type needs but lacks, or has but does not use.
         *
         * @param finType  the coil's fin type
         * @param rowPitch the coil's row pitch [m]; a wave or louver pitch must fit inside it
         */
        void checkFor(String finType, double rowPitch) {
            boolean wavy = WAVY.equalsIgnoreCase(finType.strip());
            boolean louvered = LOUVERED.equalsIgnoreCase(finType.strip());
            required(wavy, "waveHeight", waveHeight, finType);
            required(wavy, "waveLength", waveLength, finType);
            required(louvered, "louverPitch", louverPitch, finType);
            required(louvered, "louverHeight", louverHeight, finType);
            if (wavy && waveLength >= rowPitch) {
                throw new InputException("waveLength", Msg.NOT_BELOW, waveLength, rowPitch);
            }
            if (louvered && louverPitch >= rowPitch) {
                throw new InputException("louverPitch", Msg.NOT_BELOW, louverPitch, rowPitch);
            }
        }

        private static void required(boolean needed, String field, double value, String finType) {
            if (needed && value == 0) {
                throw new InputException(field, Msg.IMPOSSIBLE, "is missing: " + finType + " fins need it");
            }
            if (!needed && value != 0) {
                throw new InputException(field, Msg.IMPOSSIBLE, "belongs to "
                        + (field.startsWith("wave") ? WAVY : LOUVERED) + " fins; this coil has " + finType + " fins");
            }
        }
    }
}
