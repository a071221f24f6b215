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
import org.finstack.study.Project;

/**
 * Rates every option of a project in a {@link SwingWorker}, never on the event thread, each with
 * the model its refrigerant side names ({@link CoilModels#rate}), reporting progress and honouring
 * Cancel between options. The cautions for each option's refrigerant are gathered there too (the
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
    private SwingWorker<List<Outcome>, Void> current;
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
     * Rates every option of a project.
     *
     * @param project the project
     * @param done    receives one outcome per option, on the event thread (not after Cancel)
     */
    void rate(Project project, Consumer<List<Outcome>> done) {
        cancel();
        int mine = ++generation;
        SwingWorker<List<Outcome>, Void> w = new SwingWorker<>() {
            @Override
            protected List<Outcome> doInBackground() {
                List<Outcome> out = new ArrayList<>();
                int n = project.allOptions().size();
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
                    setProgress((i + 1) * 100 / n);
                }
                return out;
            }

            @Override
            protected void done() {
                if (mine != generation || isCancelled()) {
                    return;
                }
                pending = false;
                listener.progress(false, 100);
                try {
                    done.accept(get());
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
