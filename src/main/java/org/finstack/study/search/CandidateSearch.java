package org.finstack.study.search;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Rating;
import org.finstack.core.Check;
import org.finstack.core.FinstackException;
import org.finstack.geometry.CoilGeometry;
import org.finstack.study.Conditions;
import org.finstack.study.Constraints;
import org.finstack.study.Progress;
import org.finstack.study.Project;
import org.finstack.study.fan.FanCurve;
import org.finstack.study.pressure.DesignPressureMargin;

/**
 * Searches a project's candidate space: generates the candidates ({@link CandidateGenerator}),
 * rates each at the project's conditions with the model the project's refrigerant side names
 * ({@link CoilModels#rate}), on a fixed pool of worker threads, then ranks them
 * ({@link Ranking}) and marks the Pareto front. A candidate whose geometry is impossible or
 * whose rating fails is counted and skipped; it never stops the search.
 *
 * <p><b>Requirement.</b> The project's required capacity when set; else the existing coil's own
 * capacity at the project's conditions (a replacement should do at least what the coil in
 * place does); else none (see {@link Ranking} for the order without one).
 *
 * <p>Candidates inherit the project's conditions as they stand: an airflow given as a face
 * velocity gives each candidate that face velocity on its own face; one given as a volume flow
 * gives each the same volume flow.
 */
public final class CandidateSearch {

    /** Candidates one worker takes at a time (keeps the pool's hand-over cost small). */
    static final int CHUNK = 16;

    private CandidateSearch() {
    }

    /** @return worker threads by default: the machine's cores */
    public static int defaultThreads() {
        return Runtime.getRuntime().availableProcessors();
    }

    /**
     * Searches with the default space of the project ({@link SearchSpace#forProject}).
     *
     * @param project  the project
     * @param progress progress sink (called from worker threads), checked for cancellation
     * @return the result
     */
    public static SearchResult run(Project project, Progress progress) {
        return run(project, SearchSpace.forProject(project), defaultThreads(), progress);
    }

    /**
     * Searches a space.
     *
     * @param project  the project: its conditions, constraints (required capacity, fan curve) and existing coil
     * @param space    the candidates to try
     * @param threads  worker threads, at least 1
     * @param progress progress sink (called from worker threads), checked for cancellation
     * @return the result
     * @throws CancellationException when the progress sink asks to stop
     * @throws org.finstack.core.InputException for a bad fan curve in the constraints
     */
    public static SearchResult run(Project project, SearchSpace space, int threads, Progress progress) {
        Objects.requireNonNull(project, "project");
        Objects.requireNonNull(space, "space");
        Objects.requireNonNull(progress, "progress");
        Check.atLeastOne("threads", threads);
        Conditions conditions = project.conditions();
        FanCurve fan = fanCurve(project.constraints());
        List<String> notes = new ArrayList<>();
        SearchResult.Requirement requirement = requirement(project, notes);
        CandidateGenerator.Generated gen = CandidateGenerator.generate(space);
        notes.addAll(gen.notes());
        List<Candidate> candidates = gen.candidates();

        Map<List<Object>, DesignPressureMargin> margins = new HashMap<>();
        for (Candidate c : candidates) {
            CoilGeometry g = c.coil();
            margins.computeIfAbsent(tubeKey(g), k -> PressureMargins.of(g, conditions.refrigerant().fluid(),
                    conditions.refrigerant().duty()));
        }

        long start = System.nanoTime();
        Outcome[] outcomes = rateAll(candidates, conditions, threads, progress);
        double seconds = (System.nanoTime() - start) / 1e9;

        List<CandidateResult> rated = new ArrayList<>();
        List<CandidateGenerator.Failure> failures = new ArrayList<>(gen.failures());
        String model = conditions.refrigerant().model().id();
        for (int i = 0; i < candidates.size(); i++) {
            Outcome o = outcomes[i];
            Candidate c = candidates.get(i);
            if (o.rating == null) {
                failures.add(o.failure);
                continue;
            }
            Rating r = o.rating;
            model = r.model();
            Double charge = r.refrigerant() == null ? null : r.refrigerant().charge();
            rated.add(new CandidateResult(0, c, r, false, false, charge, r.geometry().metalMass(),
                    margins.get(tubeKey(c.coil())), fanReserve(fan, r)));
        }
        return new SearchResult(model, requirement, ranked(rated, requirement.capacity()), gen.count(),
                failures.size(), group(failures), notes, threads, seconds);
    }

    /**
     * Puts rated candidates in the documented order, numbers them and marks the front.
     *
     * @param rated       rated candidates in any order
     * @param requirement required capacity [W], or 0
     * @return the candidates ranked, with rank, requirement and front set
     */
    static List<CandidateResult> ranked(List<CandidateResult> rated, double requirement) {
        List<Ranking.Entry> entries = rated.stream().map(CandidateResult::entry).toList();
        boolean[] front = Ranking.paretoFront(entries);
        int[] order = Ranking.rank(entries, requirement);
        List<CandidateResult> out = new ArrayList<>(rated.size());
        for (int k = 0; k < order.length; k++) {
            int i = order[k];
            CandidateResult c = rated.get(i);
            out.add(new CandidateResult(k + 1, c.candidate(), c.rating(), Ranking.meets(requirement, entries.get(i)),
                    front[i], c.charge(), c.metalMass(), c.pressureMargin(), c.fanReserve()));
        }
        return out;
    }

    private static SearchResult.Requirement requirement(Project project, List<String> notes) {
        double required = project.constraints().requiredCapacity();
        if (required > 0) {
            return new SearchResult.Requirement(required, "required capacity of the project's constraints");
        }
        if (project.existing() != null) {
            try {
                Rating r = CoilModels.rate(project.caseOf(0));
                return new SearchResult.Requirement(r.capacity(), "capacity of the existing coil \""
                        + project.existing().name() + "\" at the project's conditions");
            } catch (FinstackException e) {
                notes.add("the existing coil could not be rated, so there is no capacity to match: " + e.getMessage());
            }
        }
        return new SearchResult.Requirement(0, "none (no required capacity and no existing coil to match)");
    }

    private static FanCurve fanCurve(Constraints k) {
        if (k.fanCurve().size() < 2) {
            return null;
        }
        double[] q = k.fanCurve().stream().mapToDouble(Constraints.FanPoint::volumeFlow).toArray();
        double[] p = k.fanCurve().stream().mapToDouble(Constraints.FanPoint::pressure).toArray();
        return new FanCurve(q, p);
    }

    private static Double fanReserve(FanCurve fan, Rating r) {
        if (fan == null || r.airVolumeFlow() < fan.minFlow() || r.airVolumeFlow() > fan.maxFlow()) {
            return null;
        }
        return fan.pressure(r.airVolumeFlow()) - r.airPressureDrop();
    }

    private static List<Object> tubeKey(CoilGeometry g) {
        return List.of(g.tubeMaterial().id(), g.tubeOuterDiameter(), g.tubeWall());
    }

    private static Outcome[] rateAll(List<Candidate> candidates, Conditions conditions, int threads,
            Progress progress) {
        int n = candidates.size();
        Outcome[] out = new Outcome[n];
        if (n == 0) {
            progress.step(0, 0);
            return out;
        }
        AtomicInteger done = new AtomicInteger();
        int pool = Math.min(threads, (n + CHUNK - 1) / CHUNK);
        ExecutorService exec = Executors.newFixedThreadPool(pool, r -> {
            Thread t = new Thread(r, "finstack-search");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> futures = new ArrayList<>();
            for (int from = 0; from < n; from += CHUNK) {
                int lo = from;
                int hi = Math.min(n, from + CHUNK);
                futures.add(exec.submit(() -> {
                    for (int i = lo; i < hi; i++) {
                        if (progress.cancelled()) {
                            return;
                        }
                        out[i] = rateOne(candidates.get(i), conditions);
                        progress.step(done.incrementAndGet(), n);
                    }
                }));
            }
            for (Future<?> f : futures) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("search interrupted");
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException re) {
                throw re;
            }
            throw new IllegalStateException(cause);
        } finally {
            exec.shutdownNow();
        }
        if (progress.cancelled() || done.get() < n) {
            throw new CancellationException("search cancelled");
        }
        return out;
    }

    private static Outcome rateOne(Candidate c, Conditions conditions) {
        try {
            return new Outcome(CoilModels.rate(conditions.caseFor(c.coil())), null);
        } catch (FinstackException e) {
            return new Outcome(null, new CandidateGenerator.Failure(c.name(), CandidateGenerator.field(e),
                    e.getMessage()));
        } catch (RuntimeException e) {
            return new Outcome(null, new CandidateGenerator.Failure(c.name(), "",
                    "internal error (" + e.getClass().getSimpleName() + "): " + e.getMessage()));
        }
    }

    private static List<SearchResult.FailureGroup> group(List<CandidateGenerator.Failure> failures) {
        Map<String, List<CandidateGenerator.Failure>> by = new LinkedHashMap<>();
        for (CandidateGenerator.Failure f : failures) {
            // kind: the field named, or without one the reason with its numbers blanked
            String kind = f.field() + "|" + (f.field().isEmpty() ? f.reason().replaceAll("[-+0-9.eE]+", "#") : "");
            by.computeIfAbsent(kind, k -> new ArrayList<>()).add(f);
        }
        return by.values().stream()
                .map(l -> new SearchResult.FailureGroup(l.get(0).field(), l.size(),
                        l.get(0).name() + ": " + l.get(0).reason()))
                .sorted(Comparator.comparingInt(SearchResult.FailureGroup::count).reversed())
                .toList();
    }

    private record Outcome(Rating rating, CandidateGenerator.Failure failure) {
    }
}
