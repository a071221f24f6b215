package org.finstack.fluid;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.fluid.blend.PseudoPureBlendFile;
import org.finstack.fluid.blend.UnsupportedBlends;
import org.finstack.fluid.table.TabulatedFluid;

/**
 * The refrigerants Finstack knows, by trade name. Names are matched without regard to case,
 * hyphens, spaces and the "R" prefix's hyphen: {@code "R134a"}, {@code "R-134a"},
 * {@code "r134a"}, {@code "R-1234ze(E)"}, {@code "HFC-134a"} all work. Each fluid's data file is
 * parsed once, on first use, and the immutable result shared (thread-safe).
 *
 * <p>{@link #byName(String)} gives the exact equation of state; coil models take
 * {@link #fast(String)}, the tables of the {@link #DEFAULT_BACKEND}.
 *
 * <p>Blends: R410A, R404A, R407C and R507A are pseudo-pure fluids
 * ({@link org.finstack.fluid.blend.Lemmon2003PseudoPureBlend}). Blends that need a multi-fluid
 * mixture model ({@link #unsupported()}) are refused by name with the reason.
 */
public final class Fluids {

    /** Canonical names, in the order {@link #all()} returns them, with their data files. */
    private static final Map<String, String> FILES = files();

    private static final Map<String, Fluid> LOADED = new ConcurrentHashMap<>();

    private static final Map<String, Fluid> TABULATED = new ConcurrentHashMap<>();

    /** How a fluid's properties are computed. */
    public enum Backend {
        /**
         * Tables built once from the equation of state ({@link TabulatedFluid}): typically 30 to
         * 300 times faster (the {@code bench} command measures it), within 0.1 % of it over the
         * coil's working range, the equation itself outside the tables.
         */
        TABLE,
        /** The reference equation of state itself. */
        EOS
    }

    /** The back end coil models use: {@link Backend#TABLE}. */
    public static final Backend DEFAULT_BACKEND = Backend.TABLE;

    private Fluids() {
    }

    private static Map<String, String> files() {
        Map<String, String> m = new LinkedHashMap<>();
        for (String n : List.of("R134a", "R32", "R125", "R290", "R600a", "R717", "R1234yf", "R1234ze(E)", "R22",
                "R143a", "R1270", "R744", "R410A", "R404A", "R407C", "R507A")) {
            m.put(n, "/org/finstack/fluid/" + n.toLowerCase(Locale.ROOT).replace("(", "").replace(")", "") + ".json");
        }
        return java.util.Collections.unmodifiableMap(m);
    }

    /** The pseudo-pure blends among {@link #FILES}. */
    private static final List<String> BLENDS = List.of("R410A", "R404A", "R407C", "R507A");

    /** Aliases (normalised) to canonical names; built from the names and well-known trade aliases. */
    private static final Map<String, String> ALIASES = aliases();

    private static Map<String, String> aliases() {
        Map<String, String> m = new ConcurrentHashMap<>();
        for (String n : FILES.keySet()) {
            m.put(normalise(n), n);
        }
        String[][] extra = {
            {"HFC134a", "R134a"}, {"HFC32", "R32"}, {"HFC125", "R125"}, {"propane", "R290"}, {"HC290", "R290"},
            {"isobutane", "R600a"}, {"HC600a", "R600a"}, {"ammonia", "R717"}, {"NH3", "R717"},
            {"HFO1234yf", "R1234yf"}, {"HFO1234ze(E)", "R1234ze(E)"}, {"HCFC22", "R22"}, {"HFC143a", "R143a"},
            {"propylene", "R1270"}, {"propene", "R1270"}, {"HC1270", "R1270"}, {"CO2", "R744"},
            {"carbondioxide", "R744"}, {"R507", "R507A"},
        };
        for (String[] e : extra) {
            m.put(normalise(e[0]), e[1]);
        }
        return Map.copyOf(m);
    }

    /**
     * @param name a trade name or alias
     * @return the key it is looked up under: lower case, without hyphens, spaces and underscores
     */
    static String normalise(String name) {
        return name.strip().toLowerCase(Locale.ROOT).replace("-", "").replace(" ", "").replace("_", "");
    }

    /**
     * @param name trade name, e.g. {@code "R-134a"}
     * @return the fluid
     * @throws InputException ({@code refrigerant.fluid}, {@link Msg#UNKNOWN_NAME}) if unknown, or
     *                        ({@code refrigerant.fluid}, {@link Msg#UNSUPPORTED_FLUID}) for a blend
     *                        Finstack cannot compute yet ({@link #unsupported()}), with the reason
     */
    public static Fluid byName(String name) {
        return LOADED.computeIfAbsent(known("refrigerant.fluid", name), Fluids::load);
    }

    /**
     * Checks a trade name without loading the fluid, so a file can be refused where it is read.
     *
     * @param field the field path to name in a refusal, e.g. {@code conditions.refrigerant.fluid}
     * @param name  trade name, e.g. {@code "R-134a"}
     * @return the canonical name
     * @throws InputException ({@code field}) as {@link #byName(String)} refuses the name
     */
    public static String known(String field, String name) {
        String canonical = name == null ? null : ALIASES.get(normalise(name));
        if (canonical == null) {
            String refused = name == null ? null : UNSUPPORTED.get(normalise(name));
            if (refused != null) {
                throw new InputException(field, Msg.UNSUPPORTED_FLUID, refused,
                        UnsupportedBlends.reasons().get(refused));
            }
            throw new InputException(field, Msg.UNKNOWN_NAME, name, String.join(", ", FILES.keySet()));
        }
        return canonical;
    }

    /**
     * @param name    trade name, e.g. {@code "R-134a"}
     * @param backend how the properties are computed
     * @return the fluid; each fluid's tables are built once, on first use, and shared
     * @throws InputException ({@code refrigerant.fluid}, {@link Msg#UNKNOWN_NAME}) if unknown
     */
    public static Fluid byName(String name, Backend backend) {
        Fluid exact = byName(name);
        if (backend == null) {
            throw new InputException("refrigerant.backend", Msg.MISSING);
        }
        return backend == Backend.EOS ? exact
                : TABULATED.computeIfAbsent(exact.name(), n -> TabulatedFluid.of(exact));
    }

    /**
     * The fluid as coil models use it: {@code byName(name, DEFAULT_BACKEND)}, the tables.
     *
     * @param name trade name, e.g. {@code "R-134a"}
     * @return the tabulated fluid
     * @throws InputException ({@code refrigerant.fluid}, {@link Msg#UNKNOWN_NAME}) if unknown
     */
    public static Fluid fast(String name) {
        return byName(name, DEFAULT_BACKEND);
    }

    private static Fluid load(String canonical) {
        String file = FILES.get(canonical);
        HelmholtzFluid eos = FluidFile.load(file);
        return BLENDS.contains(canonical) ? PseudoPureBlendFile.load(file, eos) : eos;
    }

    /** Normalised names of the refused blends to their canonical names. */
    private static final Map<String, String> UNSUPPORTED = unsupportedNames();

    private static Map<String, String> unsupportedNames() {
        Map<String, String> m = new LinkedHashMap<>();
        for (String n : UnsupportedBlends.reasons().keySet()) {
            m.put(normalise(n), n);
        }
        return Map.copyOf(m);
    }

    /**
     * @return blends the trade uses that Finstack refuses (they need a multi-fluid mixture model),
     *         canonical name to reason, in a fixed order
     */
    public static Map<String, String> unsupported() {
        return UnsupportedBlends.reasons();
    }

    /** @return the canonical names of all known pure fluids (blends: {@link #blendNames()}) */
    public static List<String> names() {
        return FILES.keySet().stream().filter(n -> !BLENDS.contains(n)).toList();
    }

    /** @return the canonical names of the supported (pseudo-pure) blends */
    public static List<String> blendNames() {
        return BLENDS;
    }

    /** @return every known pure fluid (loading those not yet loaded); blends are not included */
    public static List<Fluid> all() {
        List<Fluid> out = new ArrayList<>();
        for (String n : names()) {
            out.add(byName(n));
        }
        return List.copyOf(out);
    }
}
