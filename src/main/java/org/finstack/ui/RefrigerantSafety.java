package org.finstack.ui;

import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.finstack.core.Citation;

/**
 * A small table of refrigerants and the hazards the workbench cautions about. The safety groups
 * (letter A lower toxicity, B higher; 1 no flame propagation, 2L lower flammability, 2 flammable,
 * 3 higher flammability) are those of ASHRAE Standard 34 (from memory). "High pressure" is not an
 * ASHRAE 34 class: it marks refrigerants whose working pressures run far above those of the
 * R-22 / R-134a generation (common practice). The fluid layer will replace this table with its
 * own data.
 */
public final class RefrigerantSafety {

    /** Where the safety groups come from. */
    public static final Citation SOURCE = Citation.of("ASHRAE 34",
            "ANSI/ASHRAE Standard 34, Designation and Safety Classification of Refrigerants, ASHRAE, "
                    + "Atlanta (safety groups, from memory)");

    /** What a caution is about. */
    public enum Hazard {
        /** Working pressures far above the older refrigerants'. */
        HIGH_PRESSURE,
        /** Flammable: safety class 2L, 2 or 3. */
        FLAMMABLE,
        /** Higher toxicity: safety class B. */
        TOXIC
    }

    /**
     * One refrigerant.
     *
     * @param name    its designation, e.g. "R-32"
     * @param group   its ASHRAE 34 safety group, e.g. "A2L"
     * @param hazards what the workbench cautions about
     */
    public record Entry(String name, String group, Set<Hazard> hazards) {
    }

    private static final Map<String, Entry> TABLE = build();

    private RefrigerantSafety() {
    }

    private static Map<String, Entry> build() {
        Map<String, Entry> m = new LinkedHashMap<>();
        // Safety groups: ASHRAE Standard 34 (from memory). High pressure: common practice.
        put(m, "R-22", "A1");
        put(m, "R-134a", "A1");
        put(m, "R-404A", "A1");
        put(m, "R-407C", "A1");
        put(m, "R-448A", "A1");
        put(m, "R-449A", "A1");
        put(m, "R-507A", "A1");
        put(m, "R-513A", "A1");
        put(m, "R-410A", "A1", Hazard.HIGH_PRESSURE);
        put(m, "R-744", "A1", Hazard.HIGH_PRESSURE);
        put(m, "R-32", "A2L", Hazard.HIGH_PRESSURE, Hazard.FLAMMABLE);
        put(m, "R-454B", "A2L", Hazard.HIGH_PRESSURE, Hazard.FLAMMABLE);
        put(m, "R-1234yf", "A2L", Hazard.FLAMMABLE);
        put(m, "R-1234ze(E)", "A2L", Hazard.FLAMMABLE);
        put(m, "R-290", "A3", Hazard.FLAMMABLE);
        put(m, "R-600a", "A3", Hazard.FLAMMABLE);
        put(m, "R-1270", "A3", Hazard.FLAMMABLE);
        put(m, "R-717", "B2L", Hazard.TOXIC, Hazard.FLAMMABLE);
        return m;
    }

    private static void put(Map<String, Entry> m, String name, String group, Hazard... hazards) {
        Set<Hazard> h = hazards.length == 0 ? EnumSet.noneOf(Hazard.class) : EnumSet.of(hazards[0], hazards);
        m.put(key(name), new Entry(name, group, Set.copyOf(h)));
    }

    /** Compares designations without dashes, spaces or case, so "R410A", "r-410a" and "R 410A" match. */
    private static String key(String name) {
        String k = name == null ? "" : name.strip().toUpperCase(Locale.ROOT).replace("-", "").replace(" ", "");
        if (k.equals("R1234ZE")) {
            return "R1234ZE(E)";
        }
        if (k.equals("CO2")) {
            return "R744";
        }
        if (k.equals("NH3") || k.equals("AMMONIA")) {
            return "R717";
        }
        return k;
    }

    /**
     * @param fluid a refrigerant designation as the user wrote it
     * @return its entry, or null when the table does not know it
     */
    public static Entry of(String fluid) {
        return TABLE.get(key(fluid));
    }

    /**
     * @param fluid a refrigerant designation
     * @return the hazards to caution about (empty when none or unknown)
     */
    public static Set<Hazard> hazards(String fluid) {
        Entry e = of(fluid);
        return e == null ? Set.of() : e.hazards();
    }

    /** @return every refrigerant in the table, by designation */
    public static Map<String, Entry> table() {
        Map<String, Entry> out = new LinkedHashMap<>();
        TABLE.values().forEach(e -> out.put(e.name(), e));
        return out;
    }
}
