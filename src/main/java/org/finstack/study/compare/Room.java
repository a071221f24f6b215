package org.finstack.study.compare;

import org.finstack.core.Check;

/**
 * The smallest occupied room a leak can reach, for the charge screen of EN 378-1 Annex C.
 *
 * @param volume                 room volume [m3]
 * @param floorArea              floor area [m2]
 * @param releaseHeight          release height h0 of the unit [m]
 * @param selfContainedAppliance whether the system is a self-contained appliance under
 *                               IEC 60335-2-89
 */
public record Room(double volume, double floorArea, double releaseHeight, boolean selfContainedAppliance) {

    /** Validates the room. */
    public Room {
        Check.positive("room.volume", volume);
        Check.positive("room.floorArea", floorArea);
        Check.positive("room.releaseHeight", releaseHeight);
    }
}
