package org.finstack.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import org.finstack.io.ProjectFiles;
import org.finstack.study.Project;
import org.finstack.study.Progress;
import org.finstack.study.compare.BandSettings;
import org.finstack.study.compare.Comparison;
import org.finstack.study.compare.DesignBasis;
import org.finstack.study.compare.OptionResult;
import org.finstack.study.explain.Explanation;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code finstack compare PROJECT.json}: rates every coil of a project side by side, each with
 * its capacity band (10th to 90th percentile, {@code --samples}, 0 for none, and {@code --seed}).
 * An option whose entry in the file is damaged (an impossible coil, a bad value) is read as a
 * damaged entry by {@link ProjectFiles}; it is reported with its reason and the others still
 * compare. The room for the charge screen comes from the project's {@code constraints.room}.
 */
@Command(name = "compare", mixinStandardHelpOptions = true,
        description = "Compares the existing coil and the candidates of a project file.")
final class CompareCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PROJECT", description = "project file (*.finstack.json)")
    private Path projectFile;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "units of the printed table: si or us (default: ${DEFAULT-VALUE})")
    private String units;

    @Option(names = "--json", description = "print one JSON object (SI values) instead of a table")
    private boolean json;

    @Option(names = "--design-temperature", paramLabel = "TEMP",
            description = "highest expected saturation temperature for the design-pressure margin, e.g. \"60 C\" "
                    + "(default: the EN 378-2 level for the entering air, from memory)")
    private String designTemperature;

    @Mixin
    private BandOptions band = new BandOptions();

    @Override
    public Integer call() throws Exception {
        UnitSystem system = Output.system(units);
        Project project = ProjectFiles.read(projectFile);
        Comparison c = Comparison.of(project, basis(project, designTemperature), band.settings(),
                Progress.NONE);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            ObjectNode root = Output.envelope("compare", projectFile);
            root.set("results", json(c));
            out.println(Output.pretty(root));
        } else {
            table(out, c, system);
        }
        return 0;
    }

    static DesignBasis basis(Project p, String designTemperature) {
        if (designTemperature == null) {
            return DesignBasis.defaultFor(p.conditions());
        }
        double t = Quantities.parse("--design-temperature", designTemperature, Dimension.TEMPERATURE);
        return DesignBasis.stated(t, "stated on the command line: " + designTemperature.strip());
    }

    static ObjectNode json(Comparison c) {
        ObjectNode res = JsonNodeFactory.instance.objectNode();
        res.put("project", c.project().name());
        res.put("designTemperature_C", c.basis().designTemperature() - 273.15);
        res.put("designBasis", c.basis().description());
        res.put("airflowFromFanCurve", c.withFan());
        res.put("recommendation", Explanation.recommendation(c));
        ArrayNode arr = res.putArray("options");
        for (OptionResult o : c.options()) {
            ObjectNode n = arr.addObject();
            n.put("name", o.name());
            n.put("existing", o.existing());
            if (!o.rated()) {
                n.put("error", o.error());
                continue;
            }
            var r = o.rating();
            n.put("model", r.model());
            n.put("capacity_W", r.capacity());
            put(n, "capacityRatio", o.capacityRatio());
            put(n, "capacityP10_W", o.capacityP10());
            put(n, "capacityP90_W", o.capacityP90());
            if (o.band() != null) {
                ObjectNode b = n.putObject("capacityBand");
                b.put("p10_W", o.band().capacityP10());
                b.put("p50_W", o.band().capacityP50());
                b.put("p90_W", o.band().capacityP90());
                b.put("samples", o.band().samples());
                b.put("failedSamples", o.band().failedSamples());
                b.put("seed", o.band().seed());
                b.put("basis", "stated airflow; air-side correlation's published scatter");
            }
            n.put("sensible_W", r.moisture().sensibleCapacity());
            n.put("latent_W", r.moisture().latentCapacity());
            n.put("airOutletTemperature_C", r.airOutletTemperature() - 273.15);
            n.put("airOutletRelativeHumidity", r.moisture().airOutletRelativeHumidity());
            n.put("airPressureDrop_Pa", o.deliveredAirPressureDrop());
            n.put("airflow_m3_s", o.airflow());
            n.put("statedAirflow_m3_s", r.airVolumeFlow());
            n.put("statedAirPressureDrop_Pa", r.airPressureDrop());
            if (o.fan() != null) {
                ObjectNode f = n.putObject("fan");
                if (o.fan().found()) {
                    f.put("airflow_m3_s", o.fan().airflow());
                    f.put("staticPressure_Pa", o.fan().staticPressure());
                    f.put("capacity_W", o.fan().capacity());
                    f.put("ratings", o.fan().ratings());
                } else {
                    f.put("error", o.fan().error());
                }
            }
            n.put("deliveredCapacity_W", o.deliveredCapacity());
            put(n, "refrigerantPressureDrop_Pa", o.refrigerantPressureDrop());
            put(n, "saturationTemperaturePenalty_K", o.saturationTemperaturePenalty());
            put(n, "charge_kg", o.chargeKg());
            n.put("internalVolume_m3", r.geometry().internalVolume());
            n.put("mass_kg", r.geometry().metalMass());
            n.put("tubeMaterial", o.coil().tubeMaterial().id());
            n.put("finMaterial", o.coil().finMaterial().id());
            if (o.coil().coating() != null) {
                n.put("coating", o.coil().coating().id());
            }
            put(n, "pressureMargin", o.pressureMargin());
            if (o.pressure() != null && o.pressure().known()) {
                n.put("pressureVerdict", o.pressure().margin().verdict().name().toLowerCase(Locale.ROOT));
                n.put("allowablePressure_Pa_gauge", o.pressure().margin().allowableGauge());
                n.put("requiredPressure_Pa_gauge", o.pressure().margin().requiredGauge());
            }
            if (o.charge() != null) {
                ObjectNode ch = n.putObject("chargeScreening");
                if (o.charge().safety() != null) {
                    ch.put("safetyClass", o.charge().safety().safetyClass().toString());
                }
                if (o.charge().screening() != null) {
                    ch.put("within", o.charge().screening().within());
                    ch.put("limit_kg", o.charge().screening().governing().maxCharge());
                    ch.put("limit", o.charge().screening().governing().name());
                }
                ArrayNode notes = ch.putArray("notes");
                o.charge().notes().forEach(notes::add);
            }
            ArrayNode w = n.putArray("warnings");
            o.warnings().forEach(w::add);
        }
        return res;
    }

    private static void put(ObjectNode n, String key, OptionalDouble v) {
        if (v.isPresent()) {
            n.put(key, v.getAsDouble());
        } else {
            n.putNull(key);
        }
    }

    private static void table(PrintWriter out, Comparison c, UnitSystem u) {
        out.println("Comparison: " + c.project().name());
        for (OptionResult o : c.options()) {
            out.println("  #" + (o.index() + 1) + "  " + o.name() + (o.existing() ? " (existing)" : ""));
        }
        List<OptionResult> rated = c.options().stream().filter(OptionResult::rated).toList();
        out.println();
        StringBuilder head = new StringBuilder(String.format(Locale.ROOT, "  %-30s", ""));
        rated.forEach(o -> head.append(String.format(Locale.ROOT, "%16s", "#" + (o.index() + 1))));
        out.println(head);
        row(out, "capacity", rated, o -> Quantities.format(o.rating().capacity(), Dimension.HEAT_FLOW, u));
        row(out, "vs existing", rated, o -> o.capacityRatio().isPresent()
                ? String.format(Locale.ROOT, "%.3f", o.capacityRatio().getAsDouble()) : "-");
        if (c.withBand()) {
            row(out, "capacity p10", rated, o -> o.band() == null ? "-"
                    : Quantities.format(o.band().capacityP10(), Dimension.HEAT_FLOW, u));
            row(out, "capacity p90", rated, o -> o.band() == null ? "-"
                    : Quantities.format(o.band().capacityP90(), Dimension.HEAT_FLOW, u));
        }
        row(out, "sensible", rated, o -> Quantities.format(o.rating().moisture().sensibleCapacity(), Dimension.HEAT_FLOW, u));
        row(out, "latent", rated, o -> Quantities.format(o.rating().moisture().latentCapacity(), Dimension.HEAT_FLOW, u));
        row(out, "air out", rated, o -> Quantities.format(o.rating().airOutletTemperature(), Dimension.TEMPERATURE, u));
        row(out, "air pressure drop (stated)", rated,
                o -> Quantities.format(o.rating().airPressureDrop(), Dimension.PRESSURE_DIFFERENCE, u));
        row(out, "airflow (stated)", rated, o -> Quantities.format(o.rating().airVolumeFlow(), Dimension.VOLUME_FLOW, u));
        if (c.withFan()) {
            row(out, "airflow on the fan", rated, o -> o.fan() != null && o.fan().found()
                    ? Quantities.format(o.fan().airflow(), Dimension.VOLUME_FLOW, u) : "none");
            row(out, "air pressure drop on fan", rated, o -> o.fan() != null && o.fan().found()
                    ? Quantities.format(o.fan().staticPressure(), Dimension.PRESSURE_DIFFERENCE, u) : "-");
            row(out, "capacity on the fan", rated, o -> o.fan() != null && o.fan().found()
                    ? Quantities.format(o.fan().capacity(), Dimension.HEAT_FLOW, u) : "-");
        }
        row(out, "refrigerant pressure drop", rated, o -> o.refrigerantPressureDrop().isPresent()
                ? Quantities.format(o.refrigerantPressureDrop().getAsDouble(), Dimension.PRESSURE_DIFFERENCE, u)
                : "not computed");
        row(out, "saturation temp. penalty", rated, o -> o.saturationTemperaturePenalty().isPresent()
                ? Quantities.format(o.saturationTemperaturePenalty().getAsDouble(), Dimension.TEMPERATURE_DIFFERENCE, u)
                : "not computed");
        row(out, "internal volume", rated, o -> Quantities.format(o.rating().geometry().internalVolume(), Dimension.VOLUME, u));
        row(out, "charge in coil", rated, o -> o.chargeKg().isPresent()
                ? Quantities.format(o.chargeKg().getAsDouble(), Dimension.MASS, u) : "not computed");
        row(out, "charge screen", rated, o -> o.charge() == null || o.charge().screening() == null ? "-"
                : (o.charge().screening().within() ? "within " : "over ")
                        + Quantities.format(o.charge().screening().governing().maxCharge(), Dimension.MASS, u));
        row(out, "metal mass", rated, o -> Quantities.format(o.rating().geometry().metalMass(), Dimension.MASS, u));
        row(out, "tubes", rated, o -> o.coil().tubeMaterial().id());
        row(out, "fins", rated, o -> o.coil().finMaterial().id() + (o.coil().coating() == null ? ""
                : "+" + o.coil().coating().id()));
        row(out, "pressure margin", rated, o -> o.pressureMargin().isPresent()
                ? String.format(Locale.ROOT, "%.2f %s", o.pressureMargin().getAsDouble(),
                        o.pressure().margin().verdict().name().toLowerCase(Locale.ROOT)) : "unknown");
        out.println("    (tubes' allowable pressure over the saturation pressure at "
                + Quantities.format(c.basis().designTemperature(), Dimension.TEMPERATURE, u) + " less ambient; "
                + c.basis().description() + ")");
        if (c.withBand()) {
            OptionResult any = c.options().stream().filter(o -> o.band() != null).findFirst().orElseThrow();
            out.println("    (capacity band: 10th to 90th percentile at the stated airflow over the air-side "
                    + "correlation's published scatter, " + any.band().samples() + " samples, seed "
                    + any.band().seed() + ")");
        }
        out.println();
        out.println(Explanation.recommendation(c));
        for (OptionResult o : c.options()) {
            if (!o.rated()) {
                out.println("  ! #" + (o.index() + 1) + " not rated: " + o.error());
            } else {
                o.warnings().forEach(w -> out.println("  ! #" + (o.index() + 1) + " " + w));
                if (o.charge() != null) {
                    o.charge().notes().forEach(x -> out.println("  * #" + (o.index() + 1) + " " + x));
                }
            }
        }
        out.println();
        out.println("Trade-offs");
        Explanation.tradeOffs(c).forEach(x -> out.println("  - " + x));
    }

    private static void row(PrintWriter out, String label, List<OptionResult> rated,
            java.util.function.Function<OptionResult, String> cell) {
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "  %-30s", label));
        rated.forEach(o -> b.append(String.format(Locale.ROOT, "%16s", cell.apply(o))));
        out.println(b);
    }
}
