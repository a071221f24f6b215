package org.finstack.study;

import java.util.List;
import org.finstack.core.Check;

/**
 * Limits a replacement must respect, and the room its refrigerant could leak into. A limit of
 * zero means "not set".
 *
 * @param maxFaceWidth     largest finned length the opening takes [m], or 0
 * @param maxFaceHeight    largest face height the opening takes [m], or 0
 * @param maxDepth         largest coil depth in the air direction [m], or 0
 * @param circuits         number of circuits the distributor feeds, or 0
 * @param requiredCapacity capacity the coil must carry [W], or 0
 * @param fanCurve         the fan's curve, volume flow against static pressure (may be empty)
 * @param room             the smallest occupied room a leak can reach, for the charge screen, or
 *                         null when not known
 */
public record Constraints(double maxFaceWidth, double maxFaceHeight, double maxDepth, int circuits,
        double requiredCapacity, List<FanPoint> fanCurve, Room room) {

    /** No constraints. */
    public static final Constraints NONE = new Constraints(0, 0, 0, 0, 0, List.of(), null);

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
     * Limits without a room.
     *
     * @param maxFaceWidth     largest finned length the opening takes [m], or 0
     * @param maxFaceHeight    largest face height the opening takes [m], or 0
     * @param maxDepth         largest coil depth in the air direction [m], or 0
     * @param circuits         number of circuits the distributor feeds, or 0
     * @param requiredCapacity capacity the coil must carry [W], or 0
     * @param fanCurve         the fan's curve (may be empty)
     */
    public Constraints(double maxFaceWidth, double maxFaceHeight, double maxDepth, int circuits,
            double requiredCapacity, List<FanPoint> fanCurve) {
        this(maxFaceWidth, maxFaceHeight, maxDepth, circuits, requiredCapacity, fanCurve, null);
    }

    /**
     * @param r the room a leak can reach, or null
     * @return these limits with that room
     */
    public Constraints withRoom(Room r) {
        return new Constraints(maxFaceWidth, maxFaceHeight, maxDepth, circuits, requiredCapacity, fanCurve, r);
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

    /**
     * The smallest occupied room a leak can reach, for the charge screen of EN 378-1 Annex C.
     *
     * @param volume                 room volume [m3]
     * @param floorArea              floor area [m2]
     * @param releaseHeight          release height h0 of the unit above the floor [m]
     * @param selfContainedAppliance whether the system is a self-contained appliance under
     *                               IEC 60335-2-89
     */
    public record Room(double volume, double floorArea, double releaseHeight, boolean selfContainedAppliance) {

        /** Validates the room (fields named as in a project file's {@code constraints.room}). */
        public Room {
            Check.positive("volume", volume);
            Check.positive("floorArea", floorArea);
            Check.positive("releaseHeight", releaseHeight);
        }
    }
}
