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
