package org.finstack.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicInteger;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.fluid.Fluids;
import org.finstack.geometry.CoilGeometry;
import org.finstack.io.ProjectFiles;
import org.finstack.study.Cautions;
import org.finstack.study.Progress;
import org.finstack.study.Project;
import org.finstack.study.pressure.DesignPressureCheck;
import org.finstack.study.pressure.DesignPressureMargin;
import org.finstack.study.search.CandidateResult;
import org.finstack.study.search.CandidateSearch;
import org.finstack.study.search.SearchResult;
import org.finstack.study.search.SearchSpace;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code finstack search PROJECT.json}: generates replacement candidates from the generic tube
 * patterns within the project's constraints, rates them all in parallel at the project's
 * conditions and prints them ranked ({@link org.finstack.study.search.Ranking}), the Pareto front
 * of capacity against air pressure drop marked.
 */
@Command(name = "search", mixinStandardHelpOptions = true,
        description = {"Searches replacement coils built on the generic tube patterns that fit the project's "
                + "constraints, rates them at the project's conditions and ranks them.",
            "Order: candidates meeting the required capacity (or, without one, the existing coil's capacity) "
                + "first, by air pressure drop, then charge, then metal mass; then the others, largest capacity "
                + "first. '*' marks the Pareto front of capacity against air pressure drop."})
final class SearchCommand implements Callable<Integer> {

    /** The ranking rule, as printed and put into the JSON. */
    static final String RANKING = "candidates meeting the requirement first, ordered by air pressure drop (lowest "
            + "first), then refrigerant charge (full models), then metal mass, then name; then those falling short, "
            + "largest capacity first; without any requirement, largest capacity first";

    /** The caution that goes with generated candidates and their design-pressure margins. */
    static final String PATTERN_CAUTION = "Candidates are built on generic patterns (common practice), not on any "
            + "maker's coil; their pressure margins are estimates. " + DesignPressureCheck.CAUTION;

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PROJECT", description = "project file (*.finstack.json)")
    private Path projectFile;

    @Option(names = "--json", description = "print one JSON object (SI values); no progress on standard error")
    private boolean json;

    @Option(names = "--limit", paramLabel = "N", defaultValue = "20",
            description = "list the best N candidates, 0 for all (default: ${DEFAULT-VALUE})")
    private int limit;

    @Option(names = "--threads", paramLabel = "N", defaultValue = "0",
            description = "worker threads (default: the machine's cores)")
    private int threads;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "units of the printed table: si or us (default: ${DEFAULT-VALUE})")
    private String units;

    @Override
    public Integer call() throws Exception {
        UnitSystem system = Output.system(units);
        if (limit < 0) {
            throw new InputException("--limit", Msg.NEGATIVE, (double) limit);
        }
        if (threads < 0) {
            throw new InputException("--threads", Msg.NEGATIVE, (double) threads);
        }
        int pool = threads == 0 ? CandidateSearch.defaultThreads() : threads;
        Project project = ProjectFiles.read(projectFile);
        SearchSpace space = SearchSpace.forProject(project);
        PrintWriter err = spec.commandLine().getErr();
        Progress progress = json ? Progress.NONE : new StderrProgress(err, pool);
        SearchResult result = CandidateSearch.run(project, space, pool, progress);
        List<CandidateResult> shown = limit == 0 || limit >= result.candidates().size() ? result.candidates()
                : result.candidates().subList(0, limit);
        PrintWriter out = spec.commandLine().getOut();
        List<String> cautions = Cautions.forFluid(Fluids.byName(project.conditions().refrigerant().fluid()));
        if (json) {
            out.println(Output.pretty(json(result, shown, cautions)));
        } else {
            table(out, project, space, result, shown, system, cautions);
        }
        return 0;
    }

    private ObjectNode json(SearchResult r, List<CandidateResult> shown, List<String> cautions) {
        ObjectNode root = Output.envelope("search", projectFile);
        ObjectNode res = root.putObject("results");
        res.put("model", r.model());
        ObjectNode req = res.putObject("requirement");
        req.put("capacity_W", r.requirement().capacity());
        req.put("basis", r.requirement().basis());
        res.put("ranking", RANKING);
        res.put("paretoFront", "capacity (higher better) against air pressure drop (lower better)");
        ObjectNode counts = res.putObject("counts");
        counts.put("generated", r.generated());
        counts.put("rated", r.rated());
        counts.put("failed", r.failed());
        counts.put("meeting", r.meeting());
        counts.put("paretoOptimal", r.paretoOptimal());
        counts.put("listed", shown.size());
        res.put("threads", r.threads());
        res.put("seconds", r.seconds());
        ArrayNode failures = res.putArray("failures");
        for (SearchResult.FailureGroup f : r.failures()) {
            failures.addObject().put("field", f.field()).put("count", f.count()).put("example", f.example());
        }
        ArrayNode notes = res.putArray("notes");
        r.notes().forEach(notes::add);
        ArrayNode list = res.putArray("candidates");
        for (CandidateResult c : shown) {
            CoilGeometry g = c.candidate().coil();
            ObjectNode o = list.addObject();
            o.put("rank", c.rank());
            o.put("meetsRequirement", c.meetsRequirement());
            o.put("paretoOptimal", c.paretoOptimal());
            o.put("name", c.candidate().name());
            o.put("description", c.candidate().description());
            o.put("pattern", c.candidate().patternId());
            ObjectNode dims = o.putObject("dimensions");
            dims.put("tubeOuterDiameter_m", g.tubeOuterDiameter());
            dims.put("tubeWall_m", g.tubeWall());
            dims.put("rows", g.rows());
            dims.put("tubesPerRow", g.tubesPerRow());
            dims.put("faceWidth_m", c.rating().geometry().faceWidth());
            dims.put("faceHeight_m", c.rating().geometry().faceHeight());
            dims.put("depth_m", c.rating().geometry().depth());
            dims.put("finPitch_m", g.finPitch());
            dims.put("finType", g.finType());
            dims.put("tubeMaterial", g.tubeMaterial().id());
            dims.put("finMaterial", g.finMaterial().id());
            dims.put("circuits", g.circuits());
            o.put("capacity_W", c.capacity());
            o.put("airPressureDrop_Pa", c.airPressureDrop());
            if (c.charge() == null) {
                o.putNull("charge_kg");
            } else {
                o.put("charge_kg", c.charge());
            }
            o.put("mass_kg", c.metalMass());
            DesignPressureMargin m = c.pressureMargin();
            if (m == null) {
                o.putNull("pressureMargin");
            } else {
                o.putObject("pressureMargin").put("margin", m.margin()).put("verdict", m.verdict().name())
                        .put("allowableGauge_Pa", m.allowableGauge()).put("requiredGauge_Pa", m.requiredGauge());
            }
            if (c.fanReserve() == null) {
                o.putNull("fanReserve_Pa");
            } else {
                o.put("fanReserve_Pa", c.fanReserve());
            }
            ArrayNode w = o.putArray("warnings");
            c.rating().warnings().forEach(w::add);
            o.set("coil", ProjectFiles.coil(g));
        }
        ArrayNode caution = root.putArray("cautions");
        caution.add(PATTERN_CAUTION);
        cautions.forEach(caution::add);
        return root;
    }

    private static void table(PrintWriter out, Project project, SearchSpace space, SearchResult r,
            List<CandidateResult> shown, UnitSystem u, List<String> cautions) {
        out.println("Candidate search for " + project.name() + " (" + r.model() + " model)");
        out.println("Opening: " + Quantities.format(space.faceWidth(), Dimension.LENGTH, u) + " wide x "
                + Quantities.format(space.faceHeight(), Dimension.LENGTH, u) + " high"
                + (space.maxDepth() > 0 ? " x " + Quantities.format(space.maxDepth(), Dimension.LENGTH, u) + " deep"
                        : ", depth not limited")
                + "; circuits " + space.circuits());
        out.println("Requirement: " + (r.requirement().capacity() > 0
                ? Quantities.format(r.requirement().capacity(), Dimension.HEAT_FLOW, u) + " (" + r.requirement().basis()
                        + ")" : r.requirement().basis()));
        out.printf(Locale.ROOT, "Candidates: %d generated, %d rated, %d failed, %d meet the requirement, %d on the "
                + "Pareto front (%d threads, %.2f s)%n", r.generated(), r.rated(), r.failed(), r.meeting(),
                r.paretoOptimal(), r.threads(), r.seconds());
        out.println("Order: " + RANKING + ".");
        out.println();
        out.printf(Locale.ROOT, "%4s %-2s %-56s %10s %10s %9s %9s %7s%n", "rank", "", "candidate", "capacity",
                "air dp", "charge", "mass", "p-marg");
        for (CandidateResult c : shown) {
            String mark = (c.paretoOptimal() ? "*" : " ") + (c.meetsRequirement() ? " " : "-");
            out.printf(Locale.ROOT, "%4d %-2s %-56s %10s %10s %9s %9s %7s%n", c.rank(), mark, c.candidate().name(),
                    Quantities.format(c.capacity(), Dimension.HEAT_FLOW, u),
                    Quantities.format(c.airPressureDrop(), Dimension.PRESSURE_DIFFERENCE, u),
                    c.charge() == null ? "-" : Quantities.format(c.charge(), Dimension.MASS, u),
                    Quantities.format(c.metalMass(), Dimension.MASS, u),
                    c.pressureMargin() == null ? "-" : String.format(Locale.ROOT, "%.2f", c.pressureMargin().margin()));
        }
        if (shown.size() < r.rated()) {
            out.println("  ... " + (r.rated() - shown.size()) + " more (--limit 0 lists all)");
        }
        out.println("  * on the Pareto front of capacity against air pressure drop;  - short of the requirement;");
        out.println("  p-marg: tube design-pressure margin (allowable over required pressure; below 1.3 check it)");
        if (!r.failures().isEmpty()) {
            out.println();
            out.println("Failed candidates (skipped):");
            for (SearchResult.FailureGroup f : r.failures()) {
                out.println("  " + f.count() + " x " + (f.field().isEmpty() ? "" : f.field() + ": ") + "e.g. "
                        + f.example());
            }
        }
        if (!r.notes().isEmpty()) {
            out.println();
            r.notes().forEach(n -> out.println("Note: " + n));
        }
        out.println();
        out.println("Cautions:");
        out.println("  * " + PATTERN_CAUTION);
        cautions.forEach(x -> out.println("  * " + x));
    }

    /** Progress for a person: a line on standard error at every tenth of the work. */
    private static final class StderrProgress implements Progress {
        private final PrintWriter err;
        private final int threads;
        private final AtomicInteger shownTenths = new AtomicInteger(-1);

        StderrProgress(PrintWriter err, int threads) {
            this.err = err;
            this.threads = threads;
        }

        @Override
        public void step(int done, int total) {
            int tenths = total == 0 ? 10 : done * 10 / total;
            int before = shownTenths.get();
            if (tenths > before && shownTenths.compareAndSet(before, tenths)) {
                synchronized (err) {
                    err.printf(Locale.ROOT, "rating candidates on %d thread(s): %d of %d (%d %%)%n", threads, done,
                            total, tenths * 10);
                    err.flush();
                }
            }
        }

        @Override
        public boolean cancelled() {
            return false;
        }
    }
}
