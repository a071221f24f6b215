package org.finstack.units;

import static org.finstack.units.Factors.BAR;
import static org.finstack.units.Factors.BTU;
import static org.finstack.units.Factors.CALORIE;
import static org.finstack.units.Factors.CELSIUS_ZERO;
import static org.finstack.units.Factors.FAHRENHEIT_ZERO;
import static org.finstack.units.Factors.FOOT;
import static org.finstack.units.Factors.HORSEPOWER;
import static org.finstack.units.Factors.HOUR;
import static org.finstack.units.Factors.INCH;
import static org.finstack.units.Factors.INCH_OF_WATER;
import static org.finstack.units.Factors.MINUTE;
import static org.finstack.units.Factors.MM_OF_WATER;
import static org.finstack.units.Factors.OUNCE;
import static org.finstack.units.Factors.POUND;
import static org.finstack.units.Factors.PSI;
import static org.finstack.units.Factors.RANKINE;
import static org.finstack.units.Factors.STANDARD_ATMOSPHERE;
import static org.finstack.units.Factors.TON_OF_REFRIGERATION;
import static org.finstack.units.Factors.US_GALLON;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * The units of every dimension, with their spellings and default display units. Built once,
 * immutable afterwards. Composite factors are derived from the defined values in {@link Factors};
 * the value NIST SP 811 Appendix B.8 prints for each is checked by the tests.
 */
final class Catalogue {

    /** The units of one dimension, and how to find one from its spelling. */
    static final class Entry {
        private final List<Unit> units;
        private final Unit base;
        private final Map<String, Unit> exact = new HashMap<>();
        private final Map<String, String> folded = new HashMap<>();
        private final Map<String, Unit> foldedUnit = new HashMap<>();
        private final Unit si;
        private final Unit us;

        private Entry(Dimension dim, List<Unit> units, String siDefault, String usDefault) {
            this.units = List.copyOf(units);
            Unit b = null;
            for (Unit u : units) {
                if (u.symbol().equals(dim.siUnit())) {
                    b = u;
                }
                register(dim, u, u.symbol());
                for (String a : u.aliases()) {
                    register(dim, u, a);
                }
            }
            if (b == null) {
                throw new IllegalStateException(dim + ": no SI unit " + dim.siUnit());
            }
            this.base = b;
            this.si = bySymbol(dim, siDefault);
            this.us = bySymbol(dim, usDefault);
        }

        private Unit bySymbol(Dimension dim, String symbol) {
            for (Unit u : units) {
                if (u.symbol().equals(symbol)) {
                    return u;
                }
            }
            throw new IllegalStateException(dim + ": no unit " + symbol);
        }

        private void register(Dimension dim, Unit u, String spelling) {
            String k = key(spelling);
            Unit prev = exact.put(k, u);
            if (prev != null && prev != u) {
                throw new IllegalStateException(dim + ": spelling " + spelling + " names two units");
            }
            String f = k.toLowerCase(Locale.ROOT);
            Unit prevFolded = foldedUnit.get(f);
            if (prevFolded == null) {
                foldedUnit.put(f, u);
                folded.put(f, k);
            } else if (prevFolded != u) {
                // two units differ only in letter case (e.g. a milli and a mega prefix): only exact spellings find them
                folded.put(f, null);
            }
        }

        /**
         * Finds a unit by its spelling: first exactly (after {@link #key}), then ignoring letter
         * case, unless that would turn an m (milli) into an M (mega) or back.
         *
         * @return the unit, or null if none matches
         */
        Unit find(String spelling) {
            String k = key(spelling);
            if (k.isEmpty()) {
                return base;
            }
            Unit u = exact.get(k);
            if (u != null) {
                return u;
            }
            String f = k.toLowerCase(Locale.ROOT);
            String known = folded.get(f);
            if (known == null) {
                return null;
            }
            char a = k.charAt(0);
            char b = known.charAt(0);
            if (a != b && (a == 'm' || a == 'M')) {
                return null;
            }
            return foldedUnit.get(f);
        }

        List<Unit> units() {
            return units;
        }

        Unit base() {
            return base;
        }

        Unit display(UnitSystem sys) {
            return sys == UnitSystem.US ? us : si;
        }
    }

    private static final Pattern DROP = Pattern.compile("[\\s\\u00B7\\u22C5\\u2022*.\\-()\\[\\]^\\u00B0_]");
    private static final Pattern DEGREE_WORD = Pattern.compile("(?i)degrees|degree|deg");
    private static final Pattern HOUR_WORD = Pattern.compile("(?i)hr");
    private static final Pattern SECOND_WORD = Pattern.compile("(?i)sec");
    private static final Pattern POUND_WORD = Pattern.compile("(?i)lb[ms]");

    private static final Map<Dimension, Entry> ENTRIES = build();

    private Catalogue() {
    }

    /**
     * The comparable form of a unit spelling: superscripts become digits, micro signs become u,
     * degree signs and words, separators (space, middle dot, hyphen, asterisk, period, caret,
     * parentheses) are dropped, "hr" becomes "h", "sec" becomes "s", "lbm"/"lbs" become "lb",
     * "Δ" becomes "delta".
     *
     * @param spelling a unit as written
     * @return its key
     */
    static String key(String spelling) {
        String s = spelling.strip()
                .replace('\u00B2', '2').replace('\u00B3', '3')
                .replace('\u00B5', 'u').replace('\u03BC', 'u')
                .replace('\u2033', '"').replace('\u2032', '\'')
                .replace("\u0394", "delta");
        s = DEGREE_WORD.matcher(s).replaceAll("");
        s = DROP.matcher(s).replaceAll("");
        s = HOUR_WORD.matcher(s).replaceAll("h");
        s = SECOND_WORD.matcher(s).replaceAll("s");
        s = POUND_WORD.matcher(s).replaceAll("lb");
        return s;
    }

    /**
     * @param dim a dimension
     * @return its units
     */
    static Entry of(Dimension dim) {
        return ENTRIES.get(dim);
    }

    private static Map<Dimension, Entry> build() {
        Map<Dimension, Entry> m = new EnumMap<>(Dimension.class);
        List<Unit> lengths = List.of(
                Unit.linear("m", 1, "metre", "meter", "metres", "meters"),
                Unit.linear("cm", 1e-2),
                Unit.linear("mm", 1e-3, "millimetre", "millimeter", "millimetres", "millimeters"),
                Unit.linear("um", 1e-6, "µm", "micron", "microns", "micrometre", "micrometer"),
                Unit.linear("in", INCH, "\"", "inch", "inches"),
                Unit.linear("ft", FOOT, "'", "foot", "feet"));
        put(m, Dimension.LENGTH, lengths, "mm", "in");
        put(m, Dimension.AREA, List.of(
                Unit.linear("m2", 1, "sq m", "square metre", "square meter"),
                Unit.linear("cm2", 1e-4),
                Unit.linear("mm2", 1e-6),
                Unit.linear("in2", INCH * INCH, "sq in", "square inch"),
                Unit.linear("ft2", FOOT * FOOT, "sq ft", "sqft", "square foot", "square feet")),
                "m2", "ft2");
        put(m, Dimension.VOLUME, List.of(
                Unit.linear("m3", 1, "cu m", "cubic metre", "cubic meter"),
                Unit.linear("L", 1e-3, "l", "dm3", "litre", "liter", "litres", "liters"),
                Unit.linear("cm3", 1e-6, "mL", "ml", "cc"),
                Unit.linear("in3", INCH * INCH * INCH, "cu in", "cubic inch"),
                Unit.linear("ft3", FOOT * FOOT * FOOT, "cu ft", "cubic foot", "cubic feet"),
                Unit.linear("gal", US_GALLON, "US gal", "gallon", "gallons", "USgal")),
                "m3", "ft3");
        put(m, Dimension.MASS, List.of(
                Unit.linear("kg", 1, "kilogram", "kilograms"),
                Unit.linear("g", 1e-3, "gram", "grams"),
                Unit.linear("lb", POUND, "pound", "pounds"),
                Unit.linear("oz", OUNCE, "ounce", "ounces")),
                "kg", "lb");
        put(m, Dimension.TEMPERATURE, List.of(
                Unit.linear("K", 1, "kelvin"),
                Unit.scale("°C", CELSIUS_ZERO, 1, "C", "degC", "Celsius"),
                Unit.scale("°F", FAHRENHEIT_ZERO, RANKINE, "F", "degF", "Fahrenheit"),
                Unit.linear("°R", RANKINE, "R", "degR", "Rankine")),
                "°C", "°F");
        put(m, Dimension.TEMPERATURE_DIFFERENCE, List.of(
                Unit.linear("K", 1, "kelvin", "delta K", "ΔK", "dK"),
                Unit.linear("°C", 1, "C", "degC", "delta C", "Δ°C", "ΔC", "dC"),
                Unit.linear("°F", RANKINE, "F", "degF", "delta F", "Δ°F", "ΔF", "dF", "R", "°R", "degR", "delta R",
                        "Rankine")),
                "K", "°F");
        put(m, Dimension.VELOCITY, List.of(
                Unit.linear("m/s", 1, "mps"),
                Unit.linear("km/h", 1000 / HOUR, "kph"),
                Unit.linear("ft/min", FOOT / MINUTE, "fpm"),
                Unit.linear("ft/s", FOOT, "fps")),
                "m/s", "ft/min");
        put(m, Dimension.VOLUME_FLOW, List.of(
                Unit.linear("m3/s", 1),
                Unit.linear("m3/min", 1 / MINUTE),
                Unit.linear("m3/h", 1 / HOUR, "cmh"),
                Unit.linear("L/s", 1e-3, "l/s", "lps"),
                Unit.linear("L/min", 1e-3 / MINUTE, "l/min", "lpm"),
                Unit.linear("cfm", FOOT * FOOT * FOOT / MINUTE, "ft3/min"),
                Unit.linear("gpm", US_GALLON / MINUTE, "gal/min", "US gpm", "USgpm")),
                "m3/h", "cfm");
        put(m, Dimension.MASS_FLOW, List.of(
                Unit.linear("kg/s", 1),
                Unit.linear("g/s", 1e-3),
                Unit.linear("kg/min", 1 / MINUTE),
                Unit.linear("kg/h", 1 / HOUR),
                Unit.linear("lb/h", POUND / HOUR),
                Unit.linear("lb/min", POUND / MINUTE),
                Unit.linear("lb/s", POUND)),
                "kg/s", "lb/h");
        List<Unit> heat = new ArrayList<>(List.of(
                Unit.linear("W", 1, "watt", "watts"),
                Unit.linear("kW", 1e3, "kilowatt", "kilowatts"),
                Unit.linear("MW", 1e6),
                Unit.linear("Btu/h", BTU / HOUR, "Btuh", "Btu/hr"),
                // "M" for thousand in MBH: common practice in US trade usage
                Unit.linear("MBH", 1e3 * BTU / HOUR, "Mbh", "mbh", "kBtu/h", "kBtuh", "MBtuh", "MBtu/h"),
                Unit.linear("TR", TON_OF_REFRIGERATION, "ton", "tons", "RT", "ton of refrigeration",
                        "tons of refrigeration"),
                // kilocalorie_IT per hour: 4186.8 J / 3600 s = 1.163 W
                Unit.linear("kcal/h", 1e3 * CALORIE / HOUR, "kcalh")));
        put(m, Dimension.HEAT_FLOW, heat, "kW", "Btu/h");
        List<Unit> power = new ArrayList<>(heat);
        power.add(Unit.linear("hp", HORSEPOWER, "horsepower"));
        put(m, Dimension.POWER, power, "kW", "hp");
        put(m, Dimension.PRESSURE, List.of(
                Unit.linear("Pa", 1, "Pa(a)", "pascal"),
                Unit.linear("kPa", 1e3, "kPa(a)", "kPaA"),
                Unit.linear("MPa", 1e6, "MPa(a)", "MPaA"),
                Unit.linear("bar", BAR, "bar(a)", "barA"),
                Unit.linear("mbar", 1e-3 * BAR, "mbar(a)"),
                Unit.linear("psia", PSI, "psi", "psi(a)", "lbf/in2"),
                Unit.linear("atm", STANDARD_ATMOSPHERE),
                Unit.gauge("psig", PSI, "psi(g)", "psiG"),
                Unit.gauge("barg", BAR, "bar(g)", "barG"),
                Unit.gauge("kPa(g)", 1e3, "kPag", "kPaG"),
                Unit.gauge("MPa(g)", 1e6, "MPag", "MPaG")),
                "kPa", "psia");
        put(m, Dimension.PRESSURE_DIFFERENCE, List.of(
                Unit.linear("Pa", 1, "pascal"),
                Unit.linear("kPa", 1e3),
                Unit.linear("MPa", 1e6),
                Unit.linear("bar", BAR),
                Unit.linear("mbar", 1e-3 * BAR),
                Unit.linear("psi", PSI, "psid", "lbf/in2"),
                Unit.linear("in. w.c.", INCH_OF_WATER, "in wc", "in. wc", "inH2O", "in H2O", "in. H2O", "in wg",
                        "in. w.g.", "\"wc", "\" w.c.", "\"H2O", "iwc", "iwg", "inches of water", "inch of water",
                        "inch wc", "inches wc"),
                Unit.linear("mm w.c.", MM_OF_WATER, "mmH2O", "mm H2O", "mm wc", "mmwg", "mm w.g.",
                        "mm of water")),
                "Pa", "in. w.c.");
        put(m, Dimension.HEAT_TRANSFER_COEFFICIENT, List.of(
                Unit.linear("W/(m2·K)", 1, "W/(m2 °C)", "W/m2C"),
                Unit.linear("kW/(m2·K)", 1e3, "kW/(m2 °C)"),
                Unit.linear("Btu/(h·ft2·°F)", BTU / (HOUR * FOOT * FOOT * RANKINE), "Btu/(ft2·h·°F)",
                        "Btuh/(ft2·°F)", "Btuh/ft2F")),
                "W/(m2·K)", "Btu/(h·ft2·°F)");
        put(m, Dimension.FOULING_RESISTANCE, List.of(
                Unit.linear("m2·K/W", 1, "m2 °C/W", "(m2 K)/W"),
                Unit.linear("m2·K/kW", 1e-3, "m2 °C/kW"),
                Unit.linear("h·ft2·°F/Btu", HOUR * FOOT * FOOT * RANKINE / BTU, "ft2·h·°F/Btu", "ft2·°F·h/Btu",
                        "°F·ft2·h/Btu", "h·°F·ft2/Btu", "ft2·°F/Btuh", "ft2·°F/(Btu/h)")),
                "m2·K/W", "h·ft2·°F/Btu");
        put(m, Dimension.CONDUCTIVITY, List.of(
                Unit.linear("W/(m·K)", 1, "W/(m °C)", "W/mC"),
                Unit.linear("Btu/(h·ft·°F)", BTU / (HOUR * FOOT * RANKINE), "Btu/(ft·h·°F)", "Btuh/(ft·°F)",
                        "Btuh/ftF")),
                "W/(m·K)", "Btu/(h·ft·°F)");
        List<Unit> pitch = new ArrayList<>(lengths);
        pitch.add(Unit.reciprocal("fpi", INCH, "fins/in", "fins/inch", "fins per inch", "fin/in"));
        // "fpm" is not accepted here: in the trade it is feet per minute, a velocity
        pitch.add(Unit.reciprocal("fins/m", 1, "fins per metre", "fins per meter", "fin/m"));
        put(m, Dimension.FIN_PITCH, pitch, "mm", "fpi");
        put(m, Dimension.DENSITY, List.of(
                Unit.linear("kg/m3", 1),
                Unit.linear("g/L", 1, "g/l"),
                Unit.linear("g/cm3", 1e3, "g/cc", "kg/L", "kg/l"),
                Unit.linear("lb/ft3", POUND / (FOOT * FOOT * FOOT), "pcf")),
                "kg/m3", "lb/ft3");
        put(m, Dimension.SPECIFIC_ENTHALPY, List.of(
                Unit.linear("J/kg", 1),
                Unit.linear("kJ/kg", 1e3),
                Unit.linear("Btu/lb", BTU / POUND)),
                "kJ/kg", "Btu/lb");
        put(m, Dimension.SPECIFIC_HEAT, List.of(
                Unit.linear("J/(kg·K)", 1, "J/(kg °C)", "J/kgC"),
                Unit.linear("kJ/(kg·K)", 1e3, "kJ/(kg °C)", "kJ/kgC"),
                Unit.linear("Btu/(lb·°F)", BTU / (POUND * RANKINE), "Btu/(lb·°R)")),
                "kJ/(kg·K)", "Btu/(lb·°F)");
        put(m, Dimension.VISCOSITY, List.of(
                Unit.linear("Pa·s", 1, "kg/(m·s)", "N·s/m2"),
                Unit.linear("mPa·s", 1e-3, "cP", "centipoise"),
                Unit.linear("uPa·s", 1e-6, "µPa·s"),
                Unit.linear("lb/(ft·h)", POUND / (FOOT * HOUR), "lb/(h·ft)")),
                "Pa·s", "lb/(ft·h)");
        put(m, Dimension.THERMAL_RESISTANCE, List.of(
                Unit.linear("K/W", 1, "°C/W", "C/W"),
                Unit.linear("K/kW", 1e-3, "°C/kW"),
                Unit.linear("°F·h/Btu", RANKINE * HOUR / BTU, "h·°F/Btu", "°F/(Btu/h)", "°F/Btuh")),
                "K/W", "°F·h/Btu");
        put(m, Dimension.UA, List.of(
                Unit.linear("W/K", 1, "W/°C", "W/C"),
                Unit.linear("kW/K", 1e3, "kW/°C", "kW/C"),
                Unit.linear("Btu/(h·°F)", BTU / (HOUR * RANKINE), "Btuh/°F", "Btu/(°F·h)", "Btuh/F")),
                "W/K", "Btu/(h·°F)");
        put(m, Dimension.DIMENSIONLESS, List.of(
                Unit.linear("-", 1),
                Unit.linear("%", 0.01, "percent")),
                "-", "-");
        put(m, Dimension.TIME, List.of(
                Unit.linear("s", 1, "second", "seconds"),
                Unit.linear("min", MINUTE, "minute", "minutes"),
                Unit.linear("h", HOUR, "hour", "hours")),
                "s", "s");
        put(m, Dimension.ENERGY, List.of(
                Unit.linear("J", 1, "joule", "joules"),
                Unit.linear("kJ", 1e3),
                Unit.linear("MJ", 1e6),
                Unit.linear("Wh", HOUR, "W·h"),
                Unit.linear("kWh", 1e3 * HOUR, "kW·h"),
                Unit.linear("kcal", 1e3 * CALORIE),
                Unit.linear("Btu", BTU)),
                "kJ", "Btu");
        for (Dimension d : Dimension.values()) {
            if (!m.containsKey(d)) {
                throw new IllegalStateException("no units for " + d);
            }
        }
        return Collections.unmodifiableMap(m);
    }

    private static void put(Map<Dimension, Entry> m, Dimension d, List<Unit> units, String si, String us) {
        m.put(d, new Entry(d, units, si, us));
    }
}
