package org.finstack.fluid.transport;

import static org.finstack.fluid.transport.TransportLimits.pct;
import static org.finstack.fluid.transport.TransportLimits.statedAccuracy;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.finstack.core.Citation;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.core.OutOfRangeException;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.TransportProperties;
import org.finstack.fluid.internal.JsonFields;

/**
 * Transport properties of the pseudo-pure refrigerant blends R410A, R404A, R407C and R507A
 * ({@link org.finstack.fluid.blend.Lemmon2003PseudoPureBlend}), each from the blend correlations
 * published for it at its nominal composition:
 * <ul>
 * <li>viscosity: Geller, Bivens &amp; Yokozeki 2000 ({@link GellerBivensYokozeki2000Viscosity});</li>
 * <li>thermal conductivity: Geller, Nemzer &amp; Cheremnykh 2001
 * ({@link GellerNemzerCheremnykh2001Conductivity});</li>
 * <li>surface tension: Okada, Shibata, Sato &amp; Higashi 1999 ({@link Okada1999SurfaceTension}).</li>
 * </ul>
 * Both correlations are functions of temperature and mass density; the density comes from the
 * state, i.e. from the blend's pseudo-pure equation of state (Lemmon 2003). These are the
 * correlations the reference library CoolProp 8.0.0 uses for these blends (its data files carry
 * no extended-corresponding-states coefficients or Lennard-Jones parameters for them), so the
 * values can be checked against it directly. Coefficient files:
 * {@code org/finstack/fluid/transport/<blend>.json}, in the papers' units.
 *
 * <p>Two-phase-adjacent states: a blend's saturated liquid is its bubble point and its saturated
 * vapour its dew point ({@link org.finstack.fluid.SaturationState}); viscosity and conductivity of
 * those two states are the values of the correlations at their temperature and density. States
 * inside the glide (two-phase) are refused: take the saturated liquid and vapour. The surface
 * tension is taken at the bubble-point temperature.
 *
 * <p>Accuracy against CoolProp 8.0.0 at the bubble-point liquid and dew-point vapour from -50 to
 * +60 degC every 10 K and at compressed-liquid and superheated-vapour states (see
 * {@link #accuracy()}): viscosity and conductivity within 0.000001 % (relative 1e-8), surface
 * tension within 0.00000001 % (1e-10), for every blend and phase: both sides evaluate the same
 * published equations at the same densities. Against measurements: Geller et al. (2000) give an experimental uncertainty of at
 * most 1.2 % for their viscosity data; the fits' deviation statistics were not available to this
 * implementation. The pseudo-pure treatment ignores the composition shift of the coexisting phases
 * inside the glide.
 *
 * <p>Validity: temperatures of the blend's equation of state (200 K to 500 K; outside:
 * {@link OutOfRangeException}); a value that would come out zero or negative (far outside the
 * data, e.g. liquid densities the equation of state reaches only at very high pressure) is refused
 * with {@link OutOfRangeException}, never returned.
 */
public final class BlendTransport implements TransportProperties {

    private static final int FORMAT = 1;

    /**
     * Maximum deviations from CoolProp 8.0.0 [relative] over the tested states: liquid viscosity,
     * vapour viscosity, liquid conductivity, vapour conductivity, surface tension
     * (BlendTransportReferenceTest uses the same).
     */
    static final Map<String, double[]> ACCURACY = Map.of(
            "R410A", new double[] {1e-8, 1e-8, 1e-8, 1e-8, 1e-10},
            "R404A", new double[] {1e-8, 1e-8, 1e-8, 1e-8, 1e-10},
            "R407C", new double[] {1e-8, 1e-8, 1e-8, 1e-8, 1e-10},
            "R507A", new double[] {1e-8, 1e-8, 1e-8, 1e-8, 1e-10});

    private final String name;
    private final TransportLimits limits;
    private final GellerBivensYokozeki2000Viscosity viscosity;
    private final GellerNemzerCheremnykh2001Conductivity conductivity;
    private final Okada1999SurfaceTension surfaceTension;
    private final List<Citation> sources;
    private final String accuracy;

    private BlendTransport(String name, FluidInfo info, GellerBivensYokozeki2000Viscosity viscosity,
            GellerNemzerCheremnykh2001Conductivity conductivity, Okada1999SurfaceTension surfaceTension,
            List<Citation> sources) {
        this.name = name;
        this.limits = new TransportLimits(name, info, "viscosity and conductivity are not defined for a "
                        + "two-phase state of " + name + "; take them from the saturated liquid (bubble point) and "
                        + "saturated vapour (dew point)",
                "bubble-point temperature [K]");
        this.viscosity = viscosity;
        this.conductivity = conductivity;
        this.surfaceTension = surfaceTension;
        this.sources = List.copyOf(sources);
        this.accuracy = accuracySentence(name);
    }

    /**
     * @param blend one of Finstack's pseudo-pure blends (R410A, R404A, R407C, R507A)
     * @return its transport properties
     * @throws InputException     if {@code blend} is null
     * @throws FinstackException  if the fluid is not a blend or has no coefficient file
     */
    public static BlendTransport forBlend(Fluid blend) {
        if (blend == null) {
            throw new InputException("blend", Msg.MISSING);
        }
        FluidInfo info = blend.info();
        if (!info.isBlend()) {
            throw new FinstackException(Msg.IMPOSSIBLE, blend.name() + " is not a blend; its transport properties "
                    + "come from CorrelationTransport");
        }
        JsonNode root = read(blend.name());
        JsonNode v = JsonFields.req(root, "viscosity");
        JsonNode c = JsonFields.req(root, "conductivity");
        JsonNode s = JsonFields.req(root, "surfaceTension");
        requireModel(v, "geller2000");
        requireModel(c, "geller2001");
        var visc = new GellerBivensYokozeki2000Viscosity(JsonFields.arr(v, "a"), JsonFields.arr(v, "b"));
        var cond = new GellerNemzerCheremnykh2001Conductivity(JsonFields.arr(c, "a"), JsonFields.arr(c, "b"));
        var sigma = new Okada1999SurfaceTension(JsonFields.num(s, "criticalTemperature"), JsonFields.arr(s, "sigma"),
                JsonFields.arr(s, "n"));
        return new BlendTransport(blend.name(), info, visc, cond, sigma,
                List.of(Data.citation(v), Data.citation(c), Data.citation(s)));
    }

    private static void requireModel(JsonNode n, String model) {
        String m = JsonFields.text(n, "model");
        if (!model.equals(m)) {
            throw new FinstackException(Msg.MALFORMED_FILE, "blend transport model " + m + ", expected " + model);
        }
    }

    private static JsonNode read(String blend) {
        String resource = "/org/finstack/fluid/transport/" + blend.toLowerCase(Locale.ROOT) + ".json";
        return JsonFields.read(resource, FORMAT);
    }

    private static String accuracySentence(String name) {
        double[] a = statedAccuracy(ACCURACY, name);
        return String.format(Locale.ROOT, "%s, against CoolProp 8.0.0 at the bubble-point liquid and dew-point "
                + "vapour from -50 to +60 degC and at single-phase states: viscosity liquid within %s %%, vapour "
                + "within %s %%; thermal conductivity liquid within %s %%, vapour within %s %%; surface tension "
                + "within %s %%. Against measurements: the blend correlations of Geller et al. (2000, 2001) and "
                + "Okada et al. (1999) at the blend's nominal composition (viscosity data uncertain by at most "
                + "1.2 %%, Geller et al. 2000); the pseudo-pure treatment ignores the composition shift of the "
                + "phases inside the glide.", name, pct(a[0]), pct(a[1]), pct(a[2]), pct(a[3]), pct(a[4]));
    }

    @Override
    public double viscosity(FluidState state) {
        limits.checkState(state);
        return positive("viscosity [Pa s]", viscosity.at(state.temperature(), state.density()), state);
    }

    @Override
    public double conductivity(FluidState state) {
        limits.checkState(state);
        return positive("thermal conductivity [W/(m K)]", conductivity.at(state.temperature(), state.density()),
                state);
    }

    @Override
    public double surfaceTension(double temperature) {
        limits.checkSurfaceTensionTemperature(temperature);
        return surfaceTension.at(temperature);
    }

    @Override
    public List<Citation> sources() {
        return sources;
    }

    @Override
    public String accuracy() {
        return accuracy;
    }

    private double positive(String property, double value, FluidState state) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new OutOfRangeException(Msg.FLUID_OUT_OF_RANGE, name, "density [kg/m3] at T = "
                    + Numbers.brief(state.temperature()) + " K", state.density(),
                    "where the blend correlation gives a positive " + property);
        }
        return value;
    }

    @Override
    public String toString() {
        return name + " transport (" + sources.get(0).key() + ")";
    }
}
