package org.finstack.airside.fin;

import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The plate fin around one tube of a plate-fin-and-tube coil: the share of a continuous fin
 * that belongs to one collar, bounded by the tube pitches. Staggered (alternate rows shifted by
 * half a transverse pitch) tubes give a hexagonal cell, in-line tubes a rectangular one.
 *
 * @param collarDiameter  Dc, outer diameter of the fin collar on the tube [m]
 * @param finThickness    t, fin thickness [m]
 * @param transversePitch Pt, tube pitch across the air flow, within a row [m]
 * @param rowPitch        Pl, pitch between tube rows along the air flow [m]
 * @param staggered       whether alternate rows are shifted by Pt/2 (otherwise in line)
 */
public record PlateFinCell(double collarDiameter, double finThickness, double transversePitch,
        double rowPitch, boolean staggered) {

    /**
     * Validates: all lengths finite and positive, and both pitches greater than the collar
     * diameter (or the fins of neighbouring tubes would overlap).
     *
     * @throws InputException naming the field ({@code collarDiameter}, {@code finThickness},
     *                        {@code transversePitch}, {@code rowPitch}) and the reason
     */
    public PlateFinCell {
        Check.positive("collarDiameter", collarDiameter);
        Check.positive("finThickness", finThickness);
        Check.positive("transversePitch", transversePitch);
        Check.positive("rowPitch", rowPitch);
        if (!(transversePitch > collarDiameter)) {
            throw new InputException("transversePitch", Msg.PITCH_NOT_ABOVE_COLLAR, transversePitch,
                    collarDiameter);
        }
        if (!(rowPitch > collarDiameter)) {
            throw new InputException("rowPitch", Msg.PITCH_NOT_ABOVE_COLLAR, rowPitch, collarDiameter);
        }
    }

    /** @return r = Dc/2, the fin root radius [m] */
    public double collarRadius() {
        return 0.5 * collarDiameter;
    }

    /**
     * @return the distance between a tube and its nearest neighbour in the next row [m]:
     *         sqrt((Pt/2)&sup2; + Pl&sup2;) when staggered, Pl when in line
     */
    public double diagonalPitch() {
        return staggered ? Math.hypot(0.5 * transversePitch, rowPitch) : rowPitch;
    }
}
