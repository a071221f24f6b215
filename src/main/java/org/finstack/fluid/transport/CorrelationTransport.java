package org.finstack.fluid.transport;

import static org.finstack.fluid.transport.TransportLimits.pct;
import static org.finstack.fluid.transport.TransportLimits.statedAccuracy;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.finstack.core.Citation;
import org.finstack.core.FinstackException;
import org.finstack.core.Msg;
import org.finstack.core.OutOfRangeException;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.Fluids;
import org.finstack.fluid.HelmholtzFluid;
import org.finstack.fluid.TransportProperties;
import org.finstack.fluid.eos.HelmholtzEos;
import org.finstack.fluid.internal.JsonFields;

/**
 * Transport properties of one pure refrigerant from its published correlations, evaluated at the
 * state's temperature and density (from Finstack's equation of state). Immutable and thread-safe.
 *
 * <p>Methods per fluid (coefficient files {@code org/finstack/fluid/transport/<fluid>.json}):
 * <table>
 * <caption>correlations</caption>
 * <tr><th>fluid</th><th>viscosity</th><th>thermal conductivity</th></tr>
 * <tr><td>R134a</td><td>Huber, Laesecke &amp; Perkins 2003</td><td>McLinden, Klein &amp; Perkins 2000</td></tr>
 * <tr><td>R125</td><td>Huber &amp; Laesecke 2006</td><td>Perkins &amp; Huber 2006</td></tr>
 * <tr><td>R290</td><td>Vogel et al. 1998</td><td>Marsh, Perkins &amp; Ramires 2002</td></tr>
 * <tr><td>R600a</td><td>Vogel, Kuechenmeister &amp; Bich 2000</td><td>Perkins 2002</td></tr>
 * <tr><td>R717</td><td>Fenghour et al. 1995</td><td>Tufeu et al. 1984 (without its critical term)</td></tr>
 * <tr><td>R744</td><td>Laesecke &amp; Muzny 2017</td><td>Huber et al. 2016</td></tr>
 * <tr><td>R1234yf, R1234ze(E)</td><td>Bell &amp; Laesecke 2016 (entropy scaling)</td><td>Perkins &amp; Huber 2011</td></tr>
 * <tr><td>R32</td><td>Bell &amp; Laesecke 2016</td><td>ECS, Huber, Laesecke &amp; Perkins 2003 (reference propane)</td></tr>
 * <tr><td>R22</td><td>Bell &amp; Laesecke 2016</td><td>ECS, McLinden, Klein &amp; Perkins 2000 (reference R134a)</td></tr>
 * <tr><td>R143a</td><td>ECS, Klein, McLinden &amp; Laesecke 1997 (reference R134a)</td><td>ECS, McLinden et al. 2000 (R134a)</td></tr>
 * <tr><td>R1270</td><td>ECS, Huber et al. 2003 (reference propane)</td><td>ECS, Huber et al. 2003 (propane)</td></tr>
 * </table>
 * Surface tension: Mulero, Cachadina &amp; Parra 2012 (R143a, R1234ze(E): Mulero &amp; Cachadina 2014).
 *
 * <p>Accuracy, measured against CoolProp 8.0.0 (an independent implementation of the same published
 * correlations; for R32 and R22 conductivity CoolProp takes the dilute-gas viscosity from
 * Lennard-Jones parameters estimated by Chung et al. 1988 instead of those of the ECS papers) at
 * saturated liquid and vapour from -50 to +60 degC and at single-phase states: see
 * {@link #accuracy()}; each value is within the stated bound for every fluid (maximum relative
 * deviation, rounded up). Uncertainty against measured data is that of the papers, typically 2-5 %
 * for viscosity and conductivity.
 *
 * <p>Validity: temperatures of the fluid's equation of state (outside: {@link OutOfRangeException});
 * two-phase states are refused ({@link FinstackException}): take the saturated liquid and vapour.
 */
public final class CorrelationTransport implements TransportProperties {

    private static final int FORMAT = 1;

    /**
     * Maximum deviations from CoolProp 8.0.0 [relative] over the tested states: liquid viscosity,
     * vapour viscosity, liquid conductivity, vapour conductivity (TransportReferenceDataTest uses the same).
     */
    static final Map<String, double[]> ACCURACY = Map.ofEntries(
            Map.entry("R134a", new double[] {1e-4, 1e-4, 1e-3, 1e-3}),
            Map.entry("R32", new double[] {1e-4, 1e-4, 0.01, 0.06}),
            Map.entry("R125", new double[] {1e-4, 1e-4, 1e-3, 1e-3}),
            Map.entry("R290", new double[] {1e-4, 1e-4, 1e-3, 1e-3}),
            Map.entry("R600a", new double[] {1e-4, 1e-4, 1e-3, 1e-3}),
            Map.entry("R717", new double[] {1e-4, 1e-4, 3e-3, 3e-3}),
            Map.entry("R1234yf", new double[] {1e-4, 1e-4, 1e-3, 1e-3}),
            Map.entry("R1234ze(E)", new double[] {1e-3, 1e-3, 1e-3, 1e-3}),
            Map.entry("R22", new double[] {1e-4, 1e-4, 0.02, 0.09}),
            Map.entry("R143a", new double[] {1e-4, 1e-4, 1e-3, 1e-3}),
            Map.entry("R1270", new double[] {1e-4, 1e-4, 1e-3, 1e-3}),
            Map.entry("R744", new double[] {1e-4, 1e-4, 1e-3, 1e-3}));

    private final String name;
    private final TransportLimits limits;
    private final ViscosityCorrelation viscosity;
    private final ConductivityCorrelation conductivity;
    private final Mulero2012SurfaceTension surfaceTension;
    private final List<Citation> sources;
    private final String accuracy;

    private CorrelationTransport(String name, FluidInfo info, ViscosityCorrelation viscosity,
            ConductivityCorrelation conductivity, Mulero2012SurfaceTension surfaceTension, List<Citation> sources,
            String accuracy) {
        this.name = name;
        this.limits = new TransportLimits(name, info, "viscosity and conductivity are not defined for a "
                        + "two-phase state; take them from the saturated liquid and vapour",
                "saturation temperature [K]");
        this.viscosity = viscosity;
        this.conductivity = conductivity;
        this.surfaceTension = surfaceTension;
        this.sources = List.copyOf(sources);
        this.accuracy = accuracy;
    }

    /**
     * @param fluid one of Finstack's pure refrigerants
     * @return its transport properties
     * @throws FinstackException if there is no coefficient file for it
     */
    public static CorrelationTransport forFluid(HelmholtzFluid fluid) {
        JsonNode root = read(fluid.name());
        List<Citation> sources = new ArrayList<>();
        ViscosityCorrelation visc = viscosity(fluid, JsonFields.req(root, "viscosity"), sources);
        JsonNode vn = JsonFields.req(root, "viscosity");
        ConductivityCorrelation cond = conductivity(fluid, JsonFields.req(root, "conductivity"), vn, visc, sources);
        JsonNode st = JsonFields.req(root, "surfaceTension");
        Mulero2012SurfaceTension sigma = Mulero2012SurfaceTension.of(st);
        sources.add(sigma.source());
        return new CorrelationTransport(fluid.name(), fluid.info(), visc, cond, sigma, sources,
                accuracySentence(fluid.name()));
    }

    private static String accuracySentence(String name) {
        double[] a = statedAccuracy(ACCURACY, name);
        return String.format(Locale.ROOT, "%s, against CoolProp 8.0.0 at saturated liquid and vapour from -50 to "
                + "+60 degC and at single-phase states: viscosity liquid within %s %%, vapour within %s %%; "
                + "thermal conductivity liquid within %s %%, vapour within %s %%; surface tension within "
                + "0.01 %%. Against measurements: the uncertainty stated by each correlation's paper "
                + "(typically 2-5 %%).", name, pct(a[0]), pct(a[1]), pct(a[2]), pct(a[3]));
    }

    private static JsonNode read(String fluid) {
        String resource = "/org/finstack/fluid/transport/"
                + fluid.toLowerCase(Locale.ROOT).replace("(", "").replace(")", "") + ".json";
        return JsonFields.read(resource, FORMAT);
    }

    private static double gasConstant(HelmholtzEos eos) {
        return eos.specificGasConstant() * eos.molarMass();
    }

    private static ViscosityCorrelation viscosity(HelmholtzFluid fluid, JsonNode n, List<Citation> sources) {
        HelmholtzEos eos = fluid.equationOfState();
        FluidInfo info = fluid.info();
        sources.add(Data.citation(n));
        String model = JsonFields.text(n, "model");
        return switch (model) {
            case "vogel1998" -> {
                sources.add(Vogel1998Viscosity.FORM);
                yield new Vogel1998Viscosity(n, eos.molarMass());
            }
            case "laeseckeMuzny2017" -> new LaeseckeMuzny2017Viscosity(n);
            case "bellLaesecke2016" -> {
                sources.add(ChapmanEnskog.CHUNG);
                sources.add(ChapmanEnskog.SOURCE);
                yield new BellLaesecke2016Viscosity(n, eos, gasConstant(eos), info.criticalTemperature(),
                        info.criticalDensity());
            }
            case "ecs" -> {
                HelmholtzFluid ref = reference(n);
                JsonNode refNode = JsonFields.req(read(ref.name()), "viscosity");
                ViscosityCorrelation refVisc = viscosity(ref, refNode, new ArrayList<>());
                sources.add(ChapmanEnskog.SOURCE);
                yield new ExtendedCorrespondingStates.Viscosity(n, ecs(fluid, ref), refVisc);
            }
            default -> throw new FinstackException(Msg.MALFORMED_FILE, "unknown viscosity model " + model);
        };
    }

    private static ConductivityCorrelation conductivity(HelmholtzFluid fluid, JsonNode n, JsonNode viscNode,
            ViscosityCorrelation visc, List<Citation> sources) {
        HelmholtzEos eos = fluid.equationOfState();
        FluidInfo info = fluid.info();
        Citation src = Data.citation(n);
        if (!sources.contains(src)) {
            sources.add(src);
        }
        JsonNode crit = n.get("critical");
        OlchowySengers1989 critical = crit == null ? null
                : new OlchowySengers1989(crit, eos, info.criticalTemperature(), info.criticalPressure(),
                        info.criticalDensity());
        if (critical != null) {
            sources.add(OlchowySengers1989.SOURCE);
        }
        String model = JsonFields.text(n, "model");
        return switch (model) {
            case "polynomial" -> new PolynomialConductivity(n, critical, visc);
            case "ecs" -> {
                HelmholtzFluid ref = reference(n);
                JsonNode refRoot = read(ref.name());
                ViscosityCorrelation refVisc = viscosity(ref, JsonFields.req(refRoot, "viscosity"), new ArrayList<>());
                ConductivityCorrelation refCond = conductivity(ref, JsonFields.req(refRoot, "conductivity"),
                        JsonFields.req(refRoot, "viscosity"), refVisc, new ArrayList<>());
                JsonNode lj = viscNode.has("lennardJones") ? viscNode.get("lennardJones") : viscNode;
                yield new ExtendedCorrespondingStates.Conductivity(n, ecs(fluid, ref), refCond, visc,
                        JsonFields.num(lj, "sigma"), JsonFields.num(lj, "epsilonOverK"), critical);
            }
            default -> throw new FinstackException(Msg.MALFORMED_FILE, "unknown conductivity model " + model);
        };
    }

    private static HelmholtzFluid reference(JsonNode n) {
        return (HelmholtzFluid) Fluids.byName(JsonFields.text(n, "referenceFluid"));
    }

    private static ExtendedCorrespondingStates ecs(HelmholtzFluid fluid, HelmholtzFluid ref) {
        HelmholtzEos eos = fluid.equationOfState();
        return new ExtendedCorrespondingStates(fluid.name(), eos, gasConstant(eos), fluid.info().criticalTemperature(),
                fluid.info().criticalDensity(), ref.equationOfState(), ref.info().criticalTemperature(),
                ref.info().criticalDensity());
    }

    @Override
    public double viscosity(FluidState state) {
        limits.checkState(state);
        return viscosity.viscosity(state.temperature(), state.density());
    }

    @Override
    public double conductivity(FluidState state) {
        limits.checkState(state);
        return conductivity.conductivity(state.temperature(), state.density());
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

    @Override
    public String toString() {
        return name + " transport (" + sources.get(0).key() + ")";
    }
}
