package org.finstack.geometry;

/**
 * Everything that follows from a {@link CoilGeometry}: areas, flow passages, volume and mass.
 * Fins are counted as a continuous density (finned length / fin pitch), so every area scales
 * exactly with the finned length; the fins' thin leading and trailing edges are not counted as
 * heat-transfer area, as in the data reduction of the Wang et al. plain-fin correlations.
 * Return bends and headers lie outside the finned length and are not included.
 *
 * @param collarDiameter     collar diameter Dc = Do + 2 t [m]
 * @param insideDiameter     tube inside diameter [m]
 * @param diagonalPitch      centre distance to the nearest tube of the next row [m]
 * @param faceHeight         tubes per row x transverse pitch [m]
 * @param faceWidth          finned length [m]
 * @param faceArea           face area [m2]
 * @param depth              coil depth in the air direction, rows x row pitch [m]
 * @param totalTubeLength    finned length x number of tubes [m]
 * @param finCount           number of fins (continuous, finned length / fin pitch)
 * @param finArea            fin surface area, both sides, less the collar holes [m2]
 * @param exposedTubeArea    collar surface between the fins [m2]
 * @param airSideArea        total air-side area Ao = fin + exposed tube [m2]
 * @param insideArea         tube inside surface [m2]
 * @param tubeOuterArea      tube outer surface pi Do L (basis of the contact resistance) [m2]
 * @param minFlowArea        minimum free-flow area for the air [m2]
 * @param sigma              minimum free-flow area over face area [-]
 * @param hydraulicDiameter  4 Amin depth / Ao [m]
 * @param internalVolume     refrigerant-side volume of the finned tubes [m3]
 * @param tubeMass           mass of the finned tube lengths [kg]
 * @param finMass            mass of the fins with their collars [kg]
 */
public record DerivedGeometry(double collarDiameter, double insideDiameter, double diagonalPitch,
        double faceHeight, double faceWidth, double faceArea, double depth, double totalTubeLength,
        double finCount, double finArea, double exposedTubeArea, double airSideArea, double insideArea,
        double tubeOuterArea, double minFlowArea, double sigma, double hydraulicDiameter,
        double internalVolume, double tubeMass, double finMass) {

    /** @return metal mass of tubes and fins [kg] */
    public double metalMass() {
        return tubeMass + finMass;
    }

    /** @return fin area over total air-side area [-] */
    public double finAreaRatio() {
        return finArea / airSideArea;
    }

    static DerivedGeometry of(CoilGeometry g) {
        double dOut = g.tubeOuterDiameter();
        double t = g.finThickness();
        double dc = g.collarDiameter();
        double di = g.insideDiameter();
        double pt = g.transversePitch();
        double pl = g.rowPitch();
        int tubes = g.tubes();
        double length = g.finnedLength();
        double faceHeight = g.tubesPerRow() * pt;
        double faceArea = faceHeight * length;
        double depth = g.rows() * pl;
        double tubeLength = tubes * length;
        double finCount = length / g.finPitch();
        double finArea = 2 * finCount * (faceHeight * depth - tubes * Math.PI * dc * dc / 4);
        double exposed = Math.PI * dc * (length - finCount * t) * tubes;
        double airSide = finArea + exposed;
        double diagonal = Math.hypot(pt / 2, pl);
        // Smallest gap a stream tube passes: between neighbours in a row, or for staggered rows
        // twice the diagonal gap (the flow splits around the next row's tube).
        double gap = pt - dc;
        if (g.arrangement() == Arrangement.STAGGERED && g.rows() > 1) {
            gap = Math.min(gap, 2 * (diagonal - dc));
        }
        double minFlow = g.tubesPerRow() * gap * (length - finCount * t);
        double sigma = minFlow / faceArea;
        double dh = 4 * minFlow * depth / airSide;
        double volume = Math.PI * di * di / 4 * tubeLength;
        double tubeMass = g.tubeMaterial().density() * Math.PI * (dOut * dOut - di * di) / 4 * tubeLength;
        double plate = faceHeight * depth - tubes * Math.PI * dOut * dOut / 4;
        double collars = tubes * Math.PI * dOut * (g.finPitch() - t);
        double finMass = g.finMaterial().density() * t * finCount * (plate + collars);
        return new DerivedGeometry(dc, di, g.arrangement() == Arrangement.STAGGERED ? diagonal : pl,
                faceHeight, length, faceArea, depth, tubeLength, finCount, finArea, exposed, airSide,
                Math.PI * di * tubeLength, Math.PI * dOut * tubeLength, minFlow, sigma, dh, volume, tubeMass,
                finMass);
    }
}
