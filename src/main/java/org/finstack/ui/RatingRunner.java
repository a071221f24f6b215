package org.finstack.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Rating;
import org.finstack.core.FinstackException;
import org.finstack.fluid.Fluids;
import org.finstack.study.Cautions;
import org.finstack.study.Progress;
import org.finstack.study.Project;
import org.finstack.study.compare.BandSettings;
import org.finstack.study.compare.Comparison;
import org.finstack.study.compare.DesignBasis;

/**
 * Rates every option of a project in a {@link SwingWorker}, never on the event thread, each with
 * the model its refrigerant side names ({@link CoilModels#rate}), hands the ratings over at once,
 * then compares the options ({@link Comparison}, with the capacity bands when they are on) in the
 * same worker, reporting progress and honouring Cancel between options. The cautions for each option's refrigerant are gathered there too (the
 * fluid's safety class comes from its data file). A newer request supersedes an older one, whose
 * results are dropped. It counts the ratings it ran and notes any that ran on the event thread,
 * so a test can check the rule.
 */
final class RatingRunner {

    /**
     * The outcome for one option.
     *
     * @param ratedCase the case rated, or null when the option could not become a case
     * @param rating    the rating, or null
     * @param error     the refusal, or null
     * @param cautions  the cautions for the refrigerant ({@link Cautions#forFluid}), empty when it is unknown
     */
    record Outcome(CoilCase ratedCase, Rating rating, FinstackException error, List<String> cautions) {
        Outcome {
            cautions = cautions == null ? List.of() : List.copyOf(cautions);
        }
    }

    /** Hears of progress. */
    interface Listener {
        /** @param running whether work is under way; @param percent how far [0..100] */
        void progress(boolean running, int percent);
    }

    private final Listener listener;
    private final AtomicInteger ratings = new AtomicInteger();
    private final AtomicInteger ratingsOnEdt = new AtomicInteger();
    private final AtomicInteger comparisons = new AtomicInteger();
    private SwingWorker<Comparison, List<Outcome>> current;
    private int generation;
    private boolean pending;

    RatingRunner(Listener listener) {
        this.listener = listener;
    }

    /** @return how many ratings ran */
    int ratings() {
        return ratings.get();
    }

    /** @return how many ratings ran on the event thread (must stay zero) */
    int ratingsOnEventThread() {
        return ratingsOnEdt.get();
    }

    /** @return whether a rating is under way or its results are not yet delivered */
    boolean running() {
        return pending;
    }

    /**
     * Rates every option of a project, then compares them.
     *
     * @param project  the project
     * @param band     whether and how to rate each option's capacity band in the comparison
     * @param rated    receives one outcome per option as soon as they are rated, on the event
     *                 thread (not after Cancel or a newer request)
     * @param compared receives the full comparison ({@link Comparison}: fan point, pressure
     *                 margin, charge screen, capacity bands) when it is done, on the event thread
     */
    void rate(Project project, BandSettings band, Consumer<List<Outcome>> rated, Consumer<Comparison> compared) {
        cancel();
        int mine = ++generation;
        SwingWorker<Comparison, List<Outcome>> w = new SwingWorker<>() {
            @Override
            protected Comparison doInBackground() {
                List<Outcome> out = new ArrayList<>();
                int n = project.allOptions().size();
                int share = band.on() ? 20 : 50;
                for (int i = 0; i < n; i++) {
                    if (isCancelled()) {
                        throw new CancellationException();
                    }
                    CoilCase c = null;
                    try {
                        c = project.caseOf(i);
                        out.add(new Outcome(c, rate(c), null, cautions(c)));
                    } catch (FinstackException e) {
                        out.add(new Outcome(c, null, e, cautions(c)));
                    }
                    setProgress((i + 1) * share / n);
                }
                publish(List.copyOf(out));
                if (SwingUtilities.isEventDispatchThread()) {
                    ratingsOnEdt.incrementAndGet();
                }
                comparisons.incrementAndGet();
                return Comparison.of(project, DesignBasis.defaultFor(project.conditions()), band, new Progress() {
                    @Override
                    public void step(int done, int total) {
                        setProgress(share + done * (100 - share) / Math.max(1, total));
                    }

                    @Override
                    public boolean cancelled() {
                        return isCancelled();
                    }
                });
            }

            @Override
            protected void process(List<List<Outcome>> chunks) {
                if (mine == generation && !isCancelled() && !chunks.isEmpty()) {
                    rated.accept(chunks.get(chunks.size() - 1));
                }
            }

            @Override
            protected void done() {
                if (mine != generation || isCancelled()) {
                    return;
                }
                pending = false;
                listener.progress(false, 100);
                try {
                    compared.accept(get());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    Thread t = Thread.currentThread();
                    t.getUncaughtExceptionHandler().uncaughtException(t, e.getCause());
                }
            }
        };
        w.addPropertyChangeListener(e -> {
            if ("progress".equals(e.getPropertyName()) && mine == generation) {
                listener.progress(true, (Integer) e.getNewValue());
            }
        });
        current = w;
        pending = true;
        listener.progress(true, 0);
        w.execute();
    }

    /** @return how many comparisons were started */
    int comparisons() {
        return comparisons.get();
    }

    private Rating rate(CoilCase c) {
        if (SwingUtilities.isEventDispatchThread()) {
            ratingsOnEdt.incrementAndGet();
        }
        ratings.incrementAndGet();
        return CoilModels.rate(c);
    }

    /**
     * @param c a case, or null
     * @return the cautions for its refrigerant, or none when it is unknown (the rating says why)
     */
    static List<String> cautions(CoilCase c) {
        if (c == null) {
            return List.of();
        }
        try {
            return Cautions.forFluid(Fluids.byName(c.refrigerant().fluid()));
        } catch (FinstackException e) {
            return List.of();
        }
    }

    /** Stops the rating under way, if any; its results are dropped. */
    void cancel() {
        if (current != null && !current.isDone()) {
            current.cancel(true);
            listener.progress(false, 0);
        }
        pending = false;
    }
}
