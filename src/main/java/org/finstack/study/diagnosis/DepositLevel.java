package org.finstack.study.diagnosis;

import java.util.Objects;
import java.util.Optional;
import org.finstack.core.Check;
import org.finstack.geometry.CoilGeometry;
import org.finstack.study.fouling.DepositLayer;

/**
 * A deposit level inferred by a diagnosis, in the physical terms of the fouling study
 * ({@link org.finstack.study.fouling.FoulingLevel}): a dust layer of uniform thickness on every
 * air-side surface, of a given effective conductivity, and the share of the clean minimum
 * free-flow area it blocks ({@link DepositLayer}).
 *
 * @param thickness       deposit thickness on each air-side surface [m], with its uncertainty
 *                        and 10th to 90th percentile range
 * @param conductivity    the deposit's effective conductivity the level rests on [W/(m K)]
 * @param blockedFraction share of the clean minimum free-flow area blocked [-], its range the
 *                        thickness range mapped through the (rising) blockage, the upper end held
 *                        at the thickest layer the model accepts; empty when the thickness itself
 *                        is beyond that layer
 * @param maxThickness    thickest layer the deposit model accepts on this coil
 *                        ({@link DepositLayer#maxThickness}) [m]
 */
public record DepositLevel(Estimate thickness, double conductivity, Optional<Estimate> blockedFraction,
        double maxThickness) {

    /** Checks the parts are present and positive where they must be. */
    public DepositLevel {
        Objects.requireNonNull(thickness, "thickness");
        Objects.requireNonNull(blockedFraction, "blockedFraction");
        Check.positive("depositConductivity", conductivity);
        Check.positive("maxThickness", maxThickness);
    }

    /**
     * @param coil         the clean coil
     * @param thickness    the inferred thickness [m] with its range
     * @param conductivity the deposit conductivity it rests on [W/(m K)]
     * @return the level with its blocked fraction
     */
    public static DepositLevel of(CoilGeometry coil, Estimate thickness, double conductivity) {
        double max = DepositLayer.maxThickness(coil);
        if (thickness.value() > max) {
            return new DepositLevel(thickness, conductivity, Optional.empty(), max);
        }
        double value = DepositLayer.blockedFraction(coil, thickness.value());
        double lowT = Math.min(thickness.low(), thickness.value());
        double highT = Math.min(thickness.high(), max);
        double low = DepositLayer.blockedFraction(coil, lowT);
        double high = DepositLayer.blockedFraction(coil, highT);
        double slope = highT > lowT ? (high - low) / (highT - lowT) : 0;
        return new DepositLevel(thickness, conductivity,
                Optional.of(new Estimate(value, slope * thickness.standardUncertainty(), low, high)), max);
    }

    /** @return whether the inferred layer is thicker than the passages hold */
    public boolean beyondModel() {
        return blockedFraction.isEmpty();
    }
}
