package org.finstack.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.finstack.coil.CoilBenchmark;
import org.finstack.study.search.SearchBenchmark;
import org.finstack.study.uncertainty.UncertaintyBand;
import org.finstack.core.InputException;
import org.finstack.fluid.table.TableBenchmark;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code finstack bench}: property calls per second of the equation of state and of the tables
 * ({@link TableBenchmark}), with a coil model's mix of calls. A measurement, not a test.
 */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = "Measures fluid-property calls per second: equation of state against tables.")
final class BenchCommand implements Callable<Integer> {

    /** Segment counts at which the tube-by-tube model is timed, to show how its time grows. */
    private static final int[] SEGMENTS = {5, 10, 20};

    /** Monte Carlo samples of the timed uncertainty band. */
    private static final int BAND_SAMPLES = 50;

    /** Demo project of the isothermal search timing (version 1 conditions). */
    private static final String ISOTHERMAL_PROJECT = "/examples/projects/otterby-condenser-options.finstack.json";

    /** Demo project of the search timing with the zone model. */
    private static final String ZONE_PROJECT = "/examples/projects/otterby-condenser-search.finstack.json";

    private static org.finstack.study.Project demoProject(String resource) throws java.io.IOException {
        try (java.io.InputStream in = BenchCommand.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("demo project missing from the jar: " + resource);
            }
            return org.finstack.io.ProjectFiles.parse(new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8),
                    "demo project");
        }
    }

    @Spec
    private CommandSpec spec;

    @Option(names = "--fluid", paramLabel = "NAME", description = "a fluid to measure (repeatable; default: all)")
    private List<String> fluids = new ArrayList<>();

    @Option(names = "--points", paramLabel = "N", defaultValue = "500",
            description = "query points per fluid (default ${DEFAULT-VALUE})")
    private int points;

    @Option(names = "--seconds", paramLabel = "S", defaultValue = "0.25",
            description = "time per back end and fluid, in seconds (default ${DEFAULT-VALUE})")
    private double seconds;

    @Option(names = "--seed", paramLabel = "SEED", defaultValue = "1", description = "random seed of the points")
    private long seed;

    @Option(names = "--json", description = "print one JSON object")
    private boolean json;

    @Option(names = "--coil-runs", paramLabel = "N", defaultValue = "5",
            description = "ratings per median for the coil models (default ${DEFAULT-VALUE}; 0 skips them)")
    private int coilRuns;

    @Override
    public Integer call() throws Exception {
        TableBenchmark.Settings settings;
        try {
            settings = new TableBenchmark.Settings(fluids, points, seconds, seed);
        } catch (InputException e) {
            throw new InputException("--" + e.field(), e.msg(), e.args());
        }
        if (coilRuns < 0 || coilRuns > 1000) {
            throw new InputException("--coil-runs", org.finstack.core.Msg.OUT_OF_BOUNDS, (double) coilRuns, 0.0, 1000.0);
        }
        TableBenchmark.Result r = TableBenchmark.run(settings);
        CoilBenchmark.Result coils = coilRuns == 0 ? null : CoilBenchmark.run(coilRuns, SEGMENTS);
        int threads = Runtime.getRuntime().availableProcessors();
        SearchBenchmark.Result search = coilRuns == 0 ? null
                : SearchBenchmark.candidatesPerSecond(demoProject(ZONE_PROJECT), threads, 1.0);
        SearchBenchmark.Result isothermalSearch = coilRuns == 0 ? null
                : SearchBenchmark.candidatesPerSecond(demoProject(ISOTHERMAL_PROJECT), threads, 1.0);
        UncertaintyBand.Timing band = coilRuns == 0 ? null
                : UncertaintyBand.time(CoilBenchmark.benchmarkCase(org.finstack.coil.RefrigerantSide.Model.ZONES, 10),
                        BAND_SAMPLES, 1);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            ObjectNode root = JsonNodeFactory.instance.objectNode();
            root.put("command", "bench");
            ObjectNode res = root.putObject("results");
            res.put("eosCallsPerSecond", r.eosCallsPerSecond());
            res.put("tableCallsPerSecond", r.tableCallsPerSecond());
            res.put("tableSpeedup", r.tableSpeedup());
            res.put("fluids", r.fluids().size());
            res.put("pointsPerFluid", points);
            res.put("eosCalls", r.eosCalls());
            res.put("tableCalls", r.tableCalls());
            res.put("tableBuildSeconds", r.buildSeconds());
            if (coils != null) {
                res.put("zoneRatingMedian_ms", coils.zoneMedianMs());
                res.put("tubeRatingMedian_ms", coils.tubeMedianMs());
                ArrayNode seg = res.putArray("tubeRatingBySegments");
                for (int i = 0; i < coils.segments().length; i++) {
                    seg.addObject().put("segments", coils.segments()[i]).put("median_ms", coils.tubeMedianMsBySegments()[i]);
                }
                res.put("coilRuns", coils.runs());
                res.put("searchCandidatesPerSecond", search.candidatesPerSecond());
                res.put("searchModel", search.model());
                res.put("searchCandidatesPerSearch", search.candidatesPerSearch());
                res.put("searchSecondsPerSearch", search.seconds() / search.searches());
                res.put("searchCandidatesPerSecondIsothermal", isothermalSearch.candidatesPerSecond());
                res.put("uncertaintyBand_ms", band.seconds() * 1000);
                res.put("uncertaintyBandSamples", BAND_SAMPLES);
            }
            ArrayNode per = res.putArray("perFluid");
            for (TableBenchmark.FluidResult f : r.fluids()) {
                ObjectNode o = per.addObject();
                o.put("fluid", f.fluid());
                o.put("points", f.points());
                o.put("droppedPoints", f.dropped());
                o.put("buildSeconds", f.buildSeconds());
                o.put("eosCallsPerSecond", f.eosCallsPerSecond());
                o.put("tableCallsPerSecond", f.tableCallsPerSecond());
                o.put("tableSpeedup", f.speedup());
                o.put("maxTemperatureDeviation_K", f.maxDeviation());
            }
            root.put("method", "per point one (p, h) flash and one saturation call at p; "
                    + "warm-up before timing; calls per second = calls / time");
            out.println(Output.pretty(root));
        } else {
            out.println("Fluid-property calls per second: equation of state (EOS) against tables");
            out.println("(per point one (p, h) flash and one saturation call; " + points + " points per fluid)");
            out.println();
            out.printf(Locale.ROOT, "  %-11s %9s %13s %13s %9s %11s%n", "fluid", "build [s]", "EOS [1/s]",
                    "tables [1/s]", "speed-up", "max dT [K]");
            for (TableBenchmark.FluidResult f : r.fluids()) {
                out.printf(Locale.ROOT, "  %-11s %9.3f %13.0f %13.0f %8.0fx %11.1e%n", f.fluid(), f.buildSeconds(),
                        f.eosCallsPerSecond(), f.tableCallsPerSecond(), f.speedup(), f.maxDeviation());
            }
            out.printf(Locale.ROOT, "  %-11s %9.3f %13.0f %13.0f %8.0fx%n", "all", r.buildSeconds(),
                    r.eosCallsPerSecond(), r.tableCallsPerSecond(), r.tableSpeedup());
            if (coils != null) {
                out.println();
                out.println("Coil ratings, median of " + coils.runs() + " (4 rows x 24 tubes, 6 circuits, R-134a evaporator, "
                        + "superheat solved):");
                out.printf(Locale.ROOT, "  zone model                      %8.2f ms%n", coils.zoneMedianMs());
                out.printf(Locale.ROOT, "  tube-by-tube, 10 segments/tube  %8.2f ms%n", coils.tubeMedianMs());
                for (int i = 0; i < coils.segments().length; i++) {
                    out.printf(Locale.ROOT, "  tube-by-tube, %2d segments/tube  %8.2f ms%n", coils.segments()[i],
                            coils.tubeMedianMsBySegments()[i]);
                }
                out.printf(Locale.ROOT, "  uncertainty band, %d samples (zone model) %8.0f ms%n", BAND_SAMPLES,
                        band.seconds() * 1000);
                out.printf(Locale.ROOT, "  candidate search (demo project, model %s)     %8.0f candidates/s "
                        + "(%d candidates in %.1f s)%n", search.model(), search.candidatesPerSecond(),
                        search.candidatesPerSearch(), search.seconds() / search.searches());
                out.printf(Locale.ROOT, "  candidate search (demo project, isothermal)  %8.0f candidates/s%n",
                        isothermalSearch.candidatesPerSecond());
            }
        }
        return 0;
    }
}
