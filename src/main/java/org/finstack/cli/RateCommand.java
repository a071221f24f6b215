package org.finstack.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.Callable;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Rating;
import org.finstack.core.Citation;
import org.finstack.core.InputException;
import org.finstack.study.uncertainty.UncertaintyBand;
import org.finstack.units.Quantities;
import org.finstack.geometry.DerivedGeometry;
import org.finstack.io.CaseFiles;
import org.finstack.io.RatingJson;
import org.finstack.units.Dimension;
import org.finstack.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code finstack rate CASE.json}: rates one case file and prints the result. */
@Command(name = "rate", mixinStandardHelpOptions = true,
        description = "Rates the coil described in a case file.")
final class RateCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE", description = "case file (JSON)")
    private Path caseFile;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "units of the printed table: si or us (default: ${DEFAULT-VALUE})")
    private String units;

    @Option(names = "--json", description = "print one JSON object (SI values) instead of a table")
    private boolean json;

    @Option(names = "--tubes", description = "add the per-tube table (tube-by-tube model)")
    private boolean tubes;

    @Option(names = "--uncertainty", paramLabel = "SAMPLES", defaultValue = "0",
            description = "add a capacity band (10th to 90th percentile) from this many Monte Carlo samples over the "
                    + "air-side correlation's published scatter (0: off)")
    private int samples;

    @Option(names = "--seed", paramLabel = "SEED", defaultValue = "1", description = "random seed of the band")
    private long seed;

    @Override
    public Integer call() throws Exception {
        UnitSystem system = Output.system(units);
        CoilCase c = CaseFiles.read(caseFile);
        Rating r = CoilModels.rate(c);
        UncertaintyBand band = samples == 0 ? null : bandOf(c);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            ObjectNode root = Output.envelope("rate", caseFile);
            root.set("results", RatingJson.results(r, tubes));
            if (band != null) {
                ObjectNode u = ((ObjectNode) root.get("results")).putObject("uncertainty");
                u.put("capacityP10_W", band.capacityP10());
                u.put("capacityP50_W", band.capacityP50());
                u.put("capacityP90_W", band.capacityP90());
                u.put("airPressureDropP10_Pa", band.pressureDropP10());
                u.put("airPressureDropP90_Pa", band.pressureDropP90());
                u.put("samples", band.samples());
                u.put("failedSamples", band.failedSamples());
                u.put("seed", band.seed());
                u.put("method", BAND_METHOD);
            }
            com.fasterxml.jackson.databind.node.ArrayNode cautions = root.putArray("cautions");
            org.finstack.study.Cautions.forFluid(org.finstack.fluid.Fluids.byName(c.refrigerant().fluid()))
                    .forEach(cautions::add);
            out.println(Output.pretty(root));
        } else {
            table(out, c, r, system);
            if (band != null) {
                out.println();
                out.println("Capacity band, 10th to 90th percentile (" + BAND_METHOD + "):");
                out.println("  " + Quantities.format(band.capacityP10(), Dimension.HEAT_FLOW, system) + " to "
                        + Quantities.format(band.capacityP90(), Dimension.HEAT_FLOW, system) + "; air pressure drop "
                        + Quantities.format(band.pressureDropP10(), Dimension.PRESSURE_DIFFERENCE, system) + " to "
                        + Quantities.format(band.pressureDropP90(), Dimension.PRESSURE_DIFFERENCE, system));
            }
        }
        return 0;
    }

    private static final String BAND_METHOD = "Monte Carlo over the air-side correlation's published scatter, "
            + "seeded, reproducible";

    private UncertaintyBand bandOf(CoilCase c) {
        try {
            return UncertaintyBand.of(c, samples, seed);
        } catch (InputException e) {
            throw e.field().equals("samples") ? new InputException("--uncertainty", e.msg(), e.args()) : e;
        }
    }

    /** Prints a rating as the {@code rate} command's tables (also the headless launch's output). */
    static void table(PrintWriter out, CoilCase c, Rating r, UnitSystem u) {
        DerivedGeometry g = r.geometry();
        Output.Table t = new Output.Table(out, u);
        out.println("Rating of " + c.coil().rows() + " rows x " + c.coil().tubesPerRow() + " tubes, "
                + c.coil().finType() + " fins, " + c.refrigerant().fluid() + " " + c.refrigerant().duty().id()
                + " (" + r.model() + " model)");
        t.section("Result");
        t.row("capacity", r.capacity(), Dimension.HEAT_FLOW);
        t.row("air in", r.airInletTemperature(), Dimension.TEMPERATURE);
        t.row("air out", r.airOutletTemperature(), Dimension.TEMPERATURE);
        Rating.RefrigerantResult solved = r.refrigerant();
        double saturation = solved == null ? c.refrigerant().saturationTemperature()
                : r.duty() == org.finstack.coil.Duty.EVAPORATOR ? solved.outletDewTemperature() : solved.inletDewTemperature();
        t.row(solved == null ? "saturation" : "saturation (dew point)", saturation, Dimension.TEMPERATURE);
        t.row("airflow", r.airVolumeFlow(), Dimension.VOLUME_FLOW);
        t.row("face velocity", r.faceVelocity(), Dimension.VELOCITY);
        t.row("air mass flow", r.airMassFlow(), Dimension.MASS_FLOW);
        t.row("air pressure drop", r.airPressureDrop(), Dimension.PRESSURE_DIFFERENCE);
        Rating.Moisture moist = r.moisture();
        if (moist.latentCapacity() > 0) {
            t.row("sensible", moist.sensibleCapacity(), Dimension.HEAT_FLOW);
            t.row("latent", moist.latentCapacity(), Dimension.HEAT_FLOW);
            t.percent("sensible heat ratio", moist.sensibleHeatRatio());
            t.row("condensate", moist.condensate(), Dimension.MASS_FLOW);
        }
        t.percent("air out, relative humidity", moist.airOutletRelativeHumidity());
        Rating.RefrigerantResult ref = r.refrigerant();
        if (ref != null) {
            t.section("Refrigerant");
            t.row("mass flow", ref.massFlow(), Dimension.MASS_FLOW);
            t.row("in", ref.inletTemperature(), Dimension.TEMPERATURE);
            t.row("out", ref.outletTemperature(), Dimension.TEMPERATURE);
            if (r.duty() == org.finstack.coil.Duty.EVAPORATOR) {
                t.row("outlet superheat", ref.outletSuperheat(), Dimension.TEMPERATURE_DIFFERENCE);
            } else {
                t.row("outlet subcooling", ref.outletSubcooling(), Dimension.TEMPERATURE_DIFFERENCE);
            }
            if (ref.outletQuality() >= 0) {
                t.plain("outlet quality", ref.outletQuality());
            }
            t.row("pressure in", ref.inletPressure(), Dimension.PRESSURE);
            t.row("pressure drop", ref.pressureDrop(), Dimension.PRESSURE_DIFFERENCE);
            t.row("saturation temp. drop", ref.saturationTemperatureDrop(), Dimension.TEMPERATURE_DIFFERENCE);
            t.row("charge", ref.charge(), Dimension.MASS);
            t.row("temperature difference", RatingJson.temperatureDifference(r), Dimension.TEMPERATURE_DIFFERENCE);
            out.println("    (" + RatingJson.TD_BASIS + ")");
            t.percent("energy balance error", ref.energyBalanceError());
        }
        if (!r.zones().isEmpty()) {
            t.section("Zones");
            for (Rating.ZoneResult z : r.zones()) {
                out.printf(java.util.Locale.ROOT, "  %-14s %5.1f %% of the coil  %s%s%n", z.name(), 100 * z.areaFraction(),
                        org.finstack.units.Quantities.format(z.duty(), Dimension.HEAT_FLOW, u), z.wet() ? "  (wet)" : "");
            }
        }
        t.section("Heat transfer");
        t.row("air-side coefficient", r.airCoefficient(), Dimension.HEAT_TRANSFER_COEFFICIENT);
        t.plain("fin efficiency", r.finEfficiency());
        t.plain("surface effectiveness", r.surfaceEffectiveness());
        t.row("UA", r.ua(), Dimension.UA);
        t.plain("NTU", r.ntu());
        t.plain("effectiveness", r.effectiveness());
        t.plain("Reynolds (collar)", r.reynoldsDc());
        t.plain("Colburn j", r.colburnJ());
        t.plain("friction f", r.frictionF());
        t.row("max. velocity", r.maxVelocity(), Dimension.VELOCITY);
        t.section("Where the heat is held back (share of 1/UA)");
        for (Map.Entry<String, Double> e : r.resistances().shares().entrySet()) {
            t.share(Output.RESISTANCE_LABELS.get(e.getKey()), e.getValue());
        }
        t.section("Geometry");
        t.row("face area", g.faceArea(), Dimension.AREA);
        t.row("air-side area", g.airSideArea(), Dimension.AREA);
        t.row("fin area", g.finArea(), Dimension.AREA);
        t.row("inside area", g.insideArea(), Dimension.AREA);
        t.row("min. free-flow area", g.minFlowArea(), Dimension.AREA);
        t.plain("free-flow / face", g.sigma());
        t.row("hydraulic diameter", g.hydraulicDiameter(), Dimension.LENGTH);
        t.row("collar diameter", g.collarDiameter(), Dimension.LENGTH);
        t.row("internal volume", g.internalVolume(), Dimension.VOLUME);
        t.row("metal mass", g.metalMass(), Dimension.MASS);
        if (!r.warnings().isEmpty()) {
            t.section("Warnings");
            r.warnings().forEach(w -> out.println("  ! " + w));
        }
        t.section("Cautions");
        org.finstack.study.Cautions.forFluid(org.finstack.fluid.Fluids.byName(c.refrigerant().fluid()))
                .forEach(x -> out.println("  * " + x));
        t.section("Methods");
        for (Citation m : r.methods()) {
            out.println("  " + m.key() + " - " + m.reference());
        }
    }
}
