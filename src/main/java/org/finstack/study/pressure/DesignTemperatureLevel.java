package org.finstack.study.pressure;

import org.finstack.core.Citation;

/**
 * Saturation temperatures at which codes set the minimum design pressure of a refrigerating
 * system's sides: the caller takes the refrigerant's saturation pressure at one of these from the
 * fluid layer and passes it to {@link DesignPressureCheck}. Each level says whether it was read
 * or is recalled ("from memory"); recalled levels must be checked against the code in force.
 */
public enum DesignTemperatureLevel {

    /** ASME B31.5 para. 501.2.4(a), low sides of all systems: 80 F (27 C) (read). */
    B31_5_LOW_SIDE(299.8167, Sources.B31_5, false, "ASME B31.5 low side, all systems: 80 F (27 C)"),
    /** ASME B31.5 para. 501.2.4(b), high side, water or evaporatively cooled: 104 F (40 C) (from memory). */
    B31_5_HIGH_SIDE_WATER_OR_EVAPORATIVE(313.15, Sources.B31_5, true,
            "ASME B31.5 high side, water or evaporatively cooled: 104 F (40 C) (from memory)"),
    /** ASME B31.5 para. 501.2.4(c), high side, air cooled: 122 F (50 C) (from memory). */
    B31_5_HIGH_SIDE_AIR(323.15, Sources.B31_5, true, "ASME B31.5 high side, air cooled: 122 F (50 C) (from memory)"),
    /** EN 378-2, high side, air-cooled condenser, ambient up to 32 C: 55 C (from memory). */
    EN378_HIGH_SIDE_AIR_AMBIENT_32(328.15, Sources.EN378_2, true,
            "EN 378-2 high side, air-cooled condenser, ambient up to 32 C: 55 C (from memory)"),
    /** EN 378-2, high side, air-cooled condenser, ambient up to 38 C: 59 C (from memory). */
    EN378_HIGH_SIDE_AIR_AMBIENT_38(332.15, Sources.EN378_2, true,
            "EN 378-2 high side, air-cooled condenser, ambient up to 38 C: 59 C (from memory)"),
    /** EN 378-2, high side, air-cooled condenser, ambient up to 43 C: 63 C (from memory). */
    EN378_HIGH_SIDE_AIR_AMBIENT_43(336.15, Sources.EN378_2, true,
            "EN 378-2 high side, air-cooled condenser, ambient up to 43 C: 63 C (from memory)"),
    /** EN 378-2, high side, evaporative condenser: 43 C (from memory). */
    EN378_HIGH_SIDE_EVAPORATIVE(316.15, Sources.EN378_2, true,
            "EN 378-2 high side, evaporative condenser: 43 C (from memory)"),
    /** EN 378-2, low side exposed to outdoor ambient up to 32 C: 32 C (from memory). */
    EN378_LOW_SIDE_OUTDOOR_32(305.15, Sources.EN378_2, true,
            "EN 378-2 low side exposed to outdoor ambient up to 32 C: 32 C (from memory)"),
    /** EN 378-2, low side exposed to outdoor ambient up to 38 C: 38 C (from memory). */
    EN378_LOW_SIDE_OUTDOOR_38(311.15, Sources.EN378_2, true,
            "EN 378-2 low side exposed to outdoor ambient up to 38 C: 38 C (from memory)"),
    /** EN 378-2, low side exposed to outdoor ambient up to 43 C: 43 C (from memory). */
    EN378_LOW_SIDE_OUTDOOR_43(316.15, Sources.EN378_2, true,
            "EN 378-2 low side exposed to outdoor ambient up to 43 C: 43 C (from memory)");

    private final double temperature;
    private final Citation source;
    private final boolean fromMemory;
    private final String description;

    DesignTemperatureLevel(double temperature, Citation source, boolean fromMemory, String description) {
        this.temperature = temperature;
        this.source = source;
        this.fromMemory = fromMemory;
        this.description = description;
    }

    /** @return the saturation temperature [K] */
    public double temperature() {
        return temperature;
    }

    /** @return the code it comes from */
    public Citation source() {
        return source;
    }

    /** @return whether the level was recalled rather than read while writing */
    public boolean fromMemory() {
        return fromMemory;
    }

    /** @return the level in words, with its code and status */
    public String description() {
        return description;
    }

    private static final class Sources {
        static final Citation B31_5 = DesignPressureCheck.SOURCE;
        static final Citation EN378_2 = Citation.of("EN 378-2",
                "EN 378-2:2016, Refrigerating systems and heat pumps - Safety and environmental requirements - "
                        + "Part 2: Design, construction, testing, marking and documentation, table of specified "
                        + "design temperatures by ambient condition (levels recalled, from memory)");
    }
}
