package org.finstack.study.search;

import java.lang.management.ManagementFactory;
import java.util.List;
import org.finstack.core.Check;
import org.finstack.material.Material;
import org.finstack.material.Materials;
import org.finstack.study.Progress;
import org.finstack.study.Project;

/**
 * Measures how many candidates a search rates per second: whole searches (generation, rating on
 * the worker pool, ranking and the Pareto front) of a space of some thousands of candidates,
 * after one untimed warm-up search, repeated until a minimum time has passed. A measurement,
 * not a test.
 *
 * <p>Measured (2 worker threads on a 2-core machine shared with other work; {@link #benchSpace}
 * of the demo projects): isothermal model, 1800 candidates per search, 14 000 to 35 000
 * candidates per second of wall-clock time; zone model, 2280 candidates per search (142 of them
 * refused with their reason: one-row louvered fins, and single-circuit 7 mm condensers that lose
 * most of their pressure), about 950 per second (2.4 s per search).
 */
public final class SearchBenchmark {

    private SearchBenchmark() {
    }

    /**
     * The figures of one measurement.
     *
     * @param candidatesPerSearch combinations each search enumerated
     * @param ratedPerSearch      candidates each search rated
     * @param searches            timed searches
     * @param seconds             their total wall-clock time [s]
     * @param threads             worker threads
     * @param model               rating model used
     * @param cpuSeconds          processor time the whole process spent meanwhile [s], or 0 where the
     *                            virtual machine does not report it
     */
    public record Result(int candidatesPerSearch, int ratedPerSearch, int searches, double seconds, int threads,
            String model, double cpuSeconds) {

        /** @return combinations enumerated per second of wall-clock time [1/s] */
        public double candidatesPerSecond() {
            return candidatesPerSearch * (double) searches / seconds;
        }

        /**
         * @return combinations enumerated per second of processor time [1/s], or 0 when not
         *         reported: the figure that holds on a machine shared with other work
         */
        public double candidatesPerCpuSecond() {
            return cpuSeconds > 0 ? candidatesPerSearch * (double) searches / cpuSeconds : 0;
        }
    }

    /**
     * A space of some thousands of candidates for a project: its default space
     * ({@link SearchSpace#forProject}) with the tube materials copper, aluminium 3003 and
     * copper-nickel 90/10, and 1, 2, 4 and 8 circuits (the project's own circuit count dropped).
     *
     * @param project the project
     * @return the space
     */
    public static SearchSpace benchSpace(Project project) {
        Materials lib = Materials.library();
        SearchSpace base = SearchSpace.forProject(project);
        List<Material> tubes = List.of(lib.tube("bench", "copper"), lib.tube("bench", "aluminium-3003"),
                lib.tube("bench", "cupronickel-90-10"));
        return base.withMaterials(tubes, base.finMaterials()).withCircuits(List.of(1, 2, 4, 8));
    }

    /**
     * Measures the benchmark space of a project ({@link #benchSpace}).
     *
     * @param project    the project (its refrigerant side names the model: isothermal or zones)
     * @param threads    worker threads, at least 1
     * @param minSeconds least time to measure [s]
     * @return the measurement
     */
    public static Result candidatesPerSecond(Project project, int threads, double minSeconds) {
        return candidatesPerSecond(project, benchSpace(project), threads, minSeconds);
    }

    /**
     * Measures a space.
     *
     * @param project    the project
     * @param space      the candidates
     * @param threads    worker threads, at least 1
     * @param minSeconds least time to measure [s], at most 600
     * @return the measurement
     */
    public static Result candidatesPerSecond(Project project, SearchSpace space, int threads, double minSeconds) {
        Check.within("minSeconds", minSeconds, 0, 600);
        SearchResult warm = CandidateSearch.run(project, space, threads, Progress.NONE);
        int searches = 0;
        long cpuStart = processCpuNanos();
        long start = System.nanoTime();
        double seconds;
        do {
            CandidateSearch.run(project, space, threads, Progress.NONE);
            searches++;
            seconds = (System.nanoTime() - start) / 1e9;
        } while (seconds < minSeconds);
        long cpu = processCpuNanos();
        double cpuSeconds = cpu > 0 && cpuStart > 0 ? (cpu - cpuStart) / 1e9 : 0;
        return new Result(warm.generated(), warm.rated(), searches, seconds, threads, warm.model(), cpuSeconds);
    }

    /** @return the process's processor time [ns], or 0 where the virtual machine does not report it */
    private static long processCpuNanos() {
        if (ManagementFactory.getOperatingSystemMXBean() instanceof com.sun.management.OperatingSystemMXBean os) {
            return Math.max(0, os.getProcessCpuTime());
        }
        return 0;
    }
}
