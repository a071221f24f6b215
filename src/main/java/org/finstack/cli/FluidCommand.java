package org.finstack.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.Fluids;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.SaturationState;
import org.finstack.fluid.TransportProperties;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code finstack fluid}: refrigerant properties from the reference equations of state. */
@Command(name = "fluid", mixinStandardHelpOptions = true,
        description = "Refrigerant properties: the list of fluids, saturation properties, or a state by pressure and enthalpy.")
final class FluidCommand implements Callable<Integer> {

    private static final double KELVIN_OFFSET = 273.15;

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FLUID", description = "refrigerant, e.g. R134a or R-410A")
    private String name;

    @Option(names = "--list", description = "list the fluids with safety class, GWP and critical point")
    private boolean list;

    @Option(names = "--temperature", paramLabel = "T", description = "saturation temperature (bubble and dew for a blend)")
    private String temperature;

    @Option(names = "--pressure", paramLabel = "P", description = "absolute pressure (with --enthalpy)")
    private String pressure;

    @Option(names = "--enthalpy", paramLabel = "H", description = "specific enthalpy, IIR reference (with --pressure)")
    private String enthalpy;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si", description = "si or us")
    private String units;

    @Option(names = "--json", description = "print one JSON object (SI values)")
    private boolean json;

    @Override
    public Integer call() throws Exception {
        UnitSystem system = Output.system(units);
        PrintWriter out = spec.commandLine().getOut();
        if (list) {
            list(out);
            return 0;
        }
        if (name == null) {
            throw new InputException("FLUID", Msg.EITHER_REQUIRED, "a fluid name", "--list");
        }
        Fluid f = Fluids.byName(name);
        if (temperature != null && (pressure != null || enthalpy != null)) {
            throw new InputException("--temperature", Msg.EXCLUSIVE, "--temperature", "--pressure with --enthalpy");
        }
        if (temperature != null) {
            saturation(out, f, Quantities.parse("--temperature", temperature, Dimension.TEMPERATURE), system);
        } else if (pressure != null && enthalpy != null) {
            state(out, f, Quantities.parse("--pressure", pressure, Dimension.PRESSURE),
                    Quantities.parse("--enthalpy", enthalpy, Dimension.SPECIFIC_ENTHALPY), system);
        } else {
            throw new InputException(pressure == null ? "--pressure" : "--enthalpy", Msg.EITHER_REQUIRED,
                    "--temperature", "--pressure with --enthalpy");
        }
        return 0;
    }

    private void list(PrintWriter out) throws Exception {
        List<Fluid> fluids = new ArrayList<>(Fluids.all());
        for (String b : Fluids.blendNames()) {
            fluids.add(Fluids.byName(b));
        }
        if (json) {
            ObjectNode root = JsonNodeFactory.instance.objectNode();
            root.put("command", "fluid");
            ArrayNode arr = root.putObject("results").putArray("fluids");
            for (Fluid f : fluids) {
                FluidInfo i = f.info();
                arr.addObject().put("name", i.name()).put("safetyClass", i.safetyClass()).put("gwp100", i.gwp100())
                        .put("gwpBasis", i.gwpBasis()).put("criticalTemperature_C", i.criticalTemperature() - KELVIN_OFFSET)
                        .put("criticalPressure_Pa", i.criticalPressure()).put("blend", i.isBlend())
                        .put("equationOfState", i.equationOfState().key());
            }
            ArrayNode refused = root.with("results").putArray("unsupported");
            for (Map.Entry<String, String> e : Fluids.unsupported().entrySet()) {
                refused.addObject().put("name", e.getKey()).put("reason", e.getValue());
            }
            out.println(Output.pretty(root));
            return;
        }
        out.printf(Locale.ROOT, "%-12s %-7s %7s %9s %10s  %s%n", "fluid", "safety", "GWP", "Tc [C]", "pc [kPa]",
                "equation of state");
        for (Fluid f : fluids) {
            FluidInfo i = f.info();
            out.printf(Locale.ROOT, "%-12s %-7s %7.0f %9.2f %10.1f  %s%n", i.name(), i.safetyClass(), i.gwp100(),
                    i.criticalTemperature() - KELVIN_OFFSET, i.criticalPressure() / 1000, i.equationOfState().key());
        }
        out.println();
        out.println("GWP: 100-year values of IPCC AR4, as in Regulation (EU) No 517/2014. Safety class: ASHRAE 34 / ISO 817.");
        out.println("Not supported yet:");
        Fluids.unsupported().forEach((k, v) -> out.println("  " + k + " - " + v));
    }

    private void saturation(PrintWriter out, Fluid f, double t, UnitSystem u) throws Exception {
        SaturationState s = f.saturationAtTemperature(t);
        FluidState l = s.liquid();
        FluidState v = s.vapour();
        TransportProperties tr = f.transport();
        boolean blend = f.info().isBlend();
        if (json) {
            ObjectNode root = JsonNodeFactory.instance.objectNode();
            root.put("command", "fluid");
            root.put("fluid", f.name());
            ObjectNode r = root.putObject("results");
            r.put("temperature_C", t - KELVIN_OFFSET);
            if (blend) {
                r.put("bubblePressure_Pa", s.bubblePressure());
                r.put("dewPressure_Pa", s.dewPressure());
            } else {
                r.put("pressure_Pa", s.dewPressure());
            }
            r.put("liquidDensity_kg_m3", l.density());
            r.put("vaporDensity_kg_m3", v.density());
            r.put("liquidEnthalpy_J_kg", l.enthalpy());
            r.put("vaporEnthalpy_J_kg", v.enthalpy());
            r.put("latentHeat_J_kg", s.latentHeat());
            r.put("liquidEntropy_J_kgK", l.entropy());
            r.put("vaporEntropy_J_kgK", v.entropy());
            r.put("liquidCp_J_kgK", l.cp());
            r.put("vaporCp_J_kgK", v.cp());
            r.put("liquidViscosity_Pa_s", tr.viscosity(l));
            r.put("vaporViscosity_Pa_s", tr.viscosity(v));
            r.put("liquidConductivity_W_mK", tr.conductivity(l));
            r.put("vaporConductivity_W_mK", tr.conductivity(v));
            r.put("surfaceTension_N_m", tr.surfaceTension(l.temperature()));
            root.put("referenceState", f.info().referenceState());
            out.println(Output.pretty(root));
            return;
        }
        Output.Table tab = new Output.Table(out, u);
        out.println(f.name() + " saturated at " + Quantities.format(t, Dimension.TEMPERATURE, u) + " ("
                + f.info().safetyClass() + ")");
        if (blend) {
            tab.row("bubble pressure", s.bubblePressure(), Dimension.PRESSURE);
            tab.row("dew pressure", s.dewPressure(), Dimension.PRESSURE);
        } else {
            tab.row("pressure", s.dewPressure(), Dimension.PRESSURE);
        }
        tab.row("liquid density", l.density(), Dimension.DENSITY);
        tab.row("vapour density", v.density(), Dimension.DENSITY);
        tab.row("liquid enthalpy", l.enthalpy(), Dimension.SPECIFIC_ENTHALPY);
        tab.row("vapour enthalpy", v.enthalpy(), Dimension.SPECIFIC_ENTHALPY);
        tab.row("latent heat", s.latentHeat(), Dimension.SPECIFIC_ENTHALPY);
        tab.row("liquid cp", l.cp(), Dimension.SPECIFIC_HEAT);
        tab.row("vapour cp", v.cp(), Dimension.SPECIFIC_HEAT);
        tab.row("liquid viscosity", tr.viscosity(l), Dimension.VISCOSITY);
        tab.row("vapour viscosity", tr.viscosity(v), Dimension.VISCOSITY);
        tab.row("liquid conductivity", tr.conductivity(l), Dimension.CONDUCTIVITY);
        tab.row("vapour conductivity", tr.conductivity(v), Dimension.CONDUCTIVITY);
        tab.plain("surface tension [N/m]", tr.surfaceTension(l.temperature()));
        out.println("  enthalpy reference: " + f.info().referenceState());
    }

    private void state(PrintWriter out, Fluid f, double p, double h, UnitSystem u) throws Exception {
        FluidState s = f.at(InputPair.PH, p, h);
        boolean single = s.hasSinglePhaseProperties();
        TransportProperties tr = single ? f.transport() : null;
        if (json) {
            ObjectNode root = JsonNodeFactory.instance.objectNode();
            root.put("command", "fluid");
            root.put("fluid", f.name());
            ObjectNode r = root.putObject("results");
            r.put("temperature_C", s.temperature() - KELVIN_OFFSET);
            r.put("pressure_Pa", s.pressure());
            r.put("enthalpy_J_kg", s.enthalpy());
            r.put("density_kg_m3", s.density());
            r.put("entropy_J_kgK", s.entropy());
            r.put("phase", s.phase().name().toLowerCase(Locale.ROOT));
            if (s.quality() >= 0) {
                r.put("quality", s.quality());
            }
            if (single) {
                r.put("cp_J_kgK", s.cp());
                r.put("cv_J_kgK", s.cv());
                r.put("speedOfSound_m_s", s.speedOfSound());
                r.put("viscosity_Pa_s", tr.viscosity(s));
                r.put("conductivity_W_mK", tr.conductivity(s));
            }
            out.println(Output.pretty(root));
            return;
        }
        Output.Table tab = new Output.Table(out, u);
        out.println(f.name() + ", " + s.phase().name().toLowerCase(Locale.ROOT).replace('_', '-'));
        tab.row("temperature", s.temperature(), Dimension.TEMPERATURE);
        tab.row("pressure", s.pressure(), Dimension.PRESSURE);
        tab.row("enthalpy", s.enthalpy(), Dimension.SPECIFIC_ENTHALPY);
        tab.row("density", s.density(), Dimension.DENSITY);
        if (s.quality() >= 0) {
            tab.plain("quality", s.quality());
        }
        if (single) {
            tab.row("cp", s.cp(), Dimension.SPECIFIC_HEAT);
            tab.row("viscosity", tr.viscosity(s), Dimension.VISCOSITY);
            tab.row("conductivity", tr.conductivity(s), Dimension.CONDUCTIVITY);
        }
    }
}
