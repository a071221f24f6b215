package org.finstack.study;

import java.util.List;
import org.finstack.core.Check;

/**
 * Limits a replacement must respect. A limit of zero means "not set".
 *
 * @param maxFaceWidth     largest finned length the opening takes [m], or 0
 * @param maxFaceHeight    largest face height the opening takes [m], or 0
 * @param maxDepth         largest coil depth in the air direction [m], or 0
 * @param circuits         number of circuits the distributor feeds, or 0
 * @param requiredCapacity capacity the coil must carry [W], or 0
 * @param fanCurve         the fan's curve, volume flow against static pressure (may be empty)
 */
public record Constraints(double maxFaceWidth, double maxFaceHeight, double maxDepth, int circuits,
        double requiredCapacity, List<FanPoint> fanCurve) {

    /** No constraints. */
    public static final Constraints NONE = new Constraints(0, 0, 0, 0, 0, List.of());

    /** Validates the limits and copies the curve. */
    public Constraints {
        Check.nonNegative("maxFaceWidth", maxFaceWidth);
        Check.nonNegative("maxFaceHeight", maxFaceHeight);
        Check.nonNegative("maxDepth", maxDepth);
        Check.nonNegative("circuits", circuits);
        Check.nonNegative("requiredCapacity", requiredCapacity);
        fanCurve = fanCurve == null ? List.of() : List.copyOf(fanCurve);
    }

    /**
     * One point of a fan curve.
     *
     * @param volumeFlow volume flow [m3/s]
     * @param pressure   static pressure the fan develops at that flow [Pa]
     */
    public record FanPoint(double volumeFlow, double pressure) {

        /** Validates the point. */
        public FanPoint {
            Check.nonNegative("volumeFlow", volumeFlow);
            Check.nonNegative("pressure", pressure);
        }
    }
}
