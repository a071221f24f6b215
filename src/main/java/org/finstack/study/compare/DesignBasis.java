package org.finstack.study.compare;

import java.util.Objects;
import java.util.Optional;
import org.finstack.coil.Duty;
import org.finstack.core.Check;
import org.finstack.core.Citation;
import org.finstack.study.Conditions;
import org.finstack.study.Constraints.Room;
import org.finstack.study.pressure.DesignPressureCheck;
import org.finstack.study.pressure.DesignTemperatureLevel;

/**
 * What the design-pressure margin and the charge screen of a comparison rest on: the highest
 * saturation temperature the coil's side of the system is expected to reach, the ambient
 * pressure, and (optionally) the room a leak can reach.
 *
 * <p>The default ({@link #defaultFor(Conditions)}) follows the levels of EN 378-2 for air-cooled
 * systems as recalled in {@link DesignTemperatureLevel} (from memory; check the edition in
 * force): a condenser takes the high-side level for the entering air (ambient) temperature,
 * 55 C up to 32 C ambient, 59 C up to 38 C, 63 C up to 43 C (and 63 C, with a note, above);
 * an evaporator takes the low-side level of 32 C (standstill at a warm ambient).
 *
 * @param designTemperature highest expected saturation temperature [K]
 * @param description       the basis in words, with its source and status
 * @param source            the code the level comes from
 * @param ambientPressure   ambient pressure [Pa absolute]
 * @param room              the room for the charge screen, or null when not known
 */
public record DesignBasis(double designTemperature, String description, Citation source, double ambientPressure,
        Room room) {

    /** Validates the basis. */
    public DesignBasis {
        Check.within("designTemperature", designTemperature, 223.15, 423.15);
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(source, "source");
        Check.positive("ambientPressure", ambientPressure);
    }

    /**
     * The default basis for a project's conditions (see the class comment).
     *
     * @param conditions the project's conditions
     * @return the basis, without a room
     */
    public static DesignBasis defaultFor(Conditions conditions) {
        DesignTemperatureLevel level;
        String extra = "";
        if (conditions.refrigerant().duty() == Duty.CONDENSER) {
            double ambient = conditions.air().temperature();
            if (ambient <= 305.15) {
                level = DesignTemperatureLevel.EN378_HIGH_SIDE_AIR_AMBIENT_32;
            } else if (ambient <= 311.15) {
                level = DesignTemperatureLevel.EN378_HIGH_SIDE_AIR_AMBIENT_38;
            } else {
                level = DesignTemperatureLevel.EN378_HIGH_SIDE_AIR_AMBIENT_43;
                if (ambient > 316.15) {
                    extra = "; the entering air is above 43 C, the highest level recalled: state the design "
                            + "temperature for this site";
                }
            }
        } else {
            level = DesignTemperatureLevel.EN378_LOW_SIDE_OUTDOOR_32;
        }
        return new DesignBasis(level.temperature(), level.description() + extra, level.source(),
                DesignPressureCheck.STANDARD_ATMOSPHERE, null);
    }

    /**
     * A basis the user states.
     *
     * @param designTemperature highest expected saturation temperature [K]
     * @param description       where it comes from, in words
     * @return the basis at standard atmospheric ambient, without a room
     */
    public static DesignBasis stated(double designTemperature, String description) {
        return new DesignBasis(designTemperature, description, Citation.of("stated",
                "design temperature stated by the user"), DesignPressureCheck.STANDARD_ATMOSPHERE, null);
    }

    /**
     * @param r the room a leak can reach
     * @return this basis with it
     */
    public DesignBasis withRoom(Room r) {
        return new DesignBasis(designTemperature, description, source, ambientPressure, r);
    }

    /** @return the room, if known */
    public Optional<Room> roomIfKnown() {
        return Optional.ofNullable(room);
    }
}
