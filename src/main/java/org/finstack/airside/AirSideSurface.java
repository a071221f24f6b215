package org.finstack.airside;

import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * What the air-side correlations need to know about a plate-fin-and-round-tube surface, all in
 * SI units. Derived quantities (the hydraulic diameter) come from the caller's geometry
 * calculation; this record only checks them for sense.
 *
 * <p>A plain fin needs no fin-pattern parameters: give {@link Pattern.Plain#INSTANCE}. Wavy and
 * louvered fins carry their own parameters in {@link Pattern.Wavy} and {@link Pattern.Louvered}.
 *
 * @param collarDiameter    Dc, tube outside diameter plus twice the fin thickness [m]
 * @param transversePitch   Pt, tube pitch normal to the air flow [m]
 * @param rowPitch          Pl, pitch between tube rows in the air-flow direction [m]
 * @param finPitch          Fp, fin pitch, centre to centre [m]
 * @param finThickness      fin thickness [m]
 * @param rows              N, number of tube rows in the air-flow direction [-]
 * @param hydraulicDiameter Dh = 4 Amin L / Ao, with Amin the minimum free-flow area, L the
 *                          coil depth in the flow direction and Ao the total air-side area [m]
 * @param staggered         whether alternate rows are offset by half a transverse pitch
 * @param pattern           the fin pattern and its parameters
 */
public record AirSideSurface(double collarDiameter, double transversePitch, double rowPitch,
        double finPitch, double finThickness, int rows, double hydraulicDiameter,
        boolean staggered, Pattern pattern) {

    /** Validates the dimensions; each failure names its field. */
    public AirSideSurface {
        Check.positive("collarDiameter", collarDiameter);
        Check.positive("transversePitch", transversePitch);
        Check.positive("rowPitch", rowPitch);
        Check.positive("finPitch", finPitch);
        Check.positive("finThickness", finThickness);
        Check.atLeastOne("rows", rows);
        Check.positive("hydraulicDiameter", hydraulicDiameter);
        if (2 * finThickness >= collarDiameter) {
            // the collar is the tube plus two fin thicknesses, so the tube would have no diameter
            throw new InputException("finThickness", Msg.NOT_BELOW, finThickness, collarDiameter / 2);
        }
        if (finPitch <= finThickness) {
            throw new InputException("finPitch", Msg.PITCH_NOT_ABOVE_THICKNESS, finPitch, finThickness);
        }
        if (transversePitch <= collarDiameter) {
            throw new InputException("transversePitch", Msg.PITCH_NOT_ABOVE_COLLAR, transversePitch, collarDiameter);
        }
        // nearest tube in the next row: straight behind (inline) or on the diagonal (staggered)
        double nextRow = staggered ? Math.hypot(rowPitch, transversePitch / 2) : rowPitch;
        if (rows > 1 && nextRow <= collarDiameter) {
            throw new InputException("rowPitch", Msg.PITCH_NOT_ABOVE_COLLAR, nextRow, collarDiameter);
        }
        if (pattern == null) {
            throw new InputException("pattern", Msg.MISSING);
        }
    }

    /**
     * A plain-fin surface.
     *
     * @param collarDiameter    Dc [m]
     * @param transversePitch   Pt [m]
     * @param rowPitch          Pl [m]
     * @param finPitch          Fp [m]
     * @param finThickness      fin thickness [m]
     * @param rows              N [-]
     * @param hydraulicDiameter Dh [m]
     * @param staggered         staggered layout
     * @return the surface
     */
    public static AirSideSurface plain(double collarDiameter, double transversePitch, double rowPitch,
            double finPitch, double finThickness, int rows, double hydraulicDiameter, boolean staggered) {
        return new AirSideSurface(collarDiameter, transversePitch, rowPitch, finPitch, finThickness, rows,
                hydraulicDiameter, staggered, Pattern.Plain.INSTANCE);
    }

    /**
     * Ratio of the total air-side area to the bare-tube outside area, Ao/At, of the continuous
     * plate-fin unit cell (one tube, one fin pitch):
     * <pre>
     *   Ao = 2 (Pt Pl - pi Dc^2 / 4) + pi Dc (Fp - t)     fin both sides, plus collar between fins
     *   At = pi Do Fp,  Do = Dc - 2 t                       tube outside surface without fins
     * </pre>
     * The fins' leading and trailing edges are not counted, as in
     * {@link org.finstack.geometry.DerivedGeometry}, so the value equals that record's
     * {@code airSideArea / tubeOuterArea} for the same coil. The louvers of a louvered fin are
     * slit and twisted out of the plate without adding area; a wavy fin's extra area from its
     * corrugation is not included. At follows the bare-tube definition of the Wang et al.
     * louvered-fin friction correlation as transcribed by Jacobi et al. (2001) (see
     * {@link WangLeeChangLin1999LouveredFin}).
     *
     * @return Ao/At [-], above 1
     */
    public double bareTubeAreaRatio() {
        double dc = collarDiameter;
        double tubeOuter = dc - 2 * finThickness;
        double finSides = 2 * (transversePitch * rowPitch - Math.PI * dc * dc / 4);
        double collar = Math.PI * dc * (finPitch - finThickness);
        return (finSides + collar) / (Math.PI * tubeOuter * finPitch);
    }

    /** @return the fin-pattern name: "plain", "wavy" or "louvered" */
    public String finType() {
        return pattern.finType();
    }

    /** The fin pattern and the parameters that go with it. */
    public sealed interface Pattern permits Pattern.Plain, Pattern.Wavy, Pattern.Louvered {

        /** @return the fin-type name used by {@link AirSideCorrelation#finType()} */
        String finType();

        /** A flat continuous plate fin; needs no further parameters. */
        enum Plain implements Pattern {
            /** The only plain pattern. */
            INSTANCE;

            @Override
            public String finType() {
                return "plain";
            }
        }

        /**
         * A wavy (herringbone) fin.
         *
         * @param waveHeight                Pd, wave height peak to valley, without the fin
         *                                  thickness [m]
         * @param projectedHalfWaveLength   Xf, projected length of half a wave in the flow
         *                                  direction [m]
         */
        record Wavy(double waveHeight, double projectedHalfWaveLength) implements Pattern {

            /** Validates the wave. */
            public Wavy {
                Check.positive("pattern.waveHeight", waveHeight);
                Check.positive("pattern.projectedHalfWaveLength", projectedHalfWaveLength);
            }

            @Override
            public String finType() {
                return "wavy";
            }
        }

        /**
         * A louvered fin.
         *
         * @param louverPitch  Lp, louver pitch in the flow direction [m]
         * @param louverHeight Lh, louver height [m]
         */
        record Louvered(double louverPitch, double louverHeight) implements Pattern {

            /** Validates the louvers. */
            public Louvered {
                Check.positive("pattern.louverPitch", louverPitch);
                Check.positive("pattern.louverHeight", louverHeight);
            }

            @Override
            public String finType() {
                return "louvered";
            }
        }
    }
}
