package org.finstack.ui;

import com.formdev.flatlaf.util.UIScale;
import java.awt.FlowLayout;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.SwingWorker;
import org.finstack.core.FinstackException;
import org.finstack.study.Progress;

/**
 * A Run button, a Cancel button, a progress bar and a one-line status for a study that runs in a
 * {@link SwingWorker}, never on the event thread. The study sees a {@link Progress} whose
 * cancellation is the worker's; Cancel stops it between its steps. A refusal
 * ({@link FinstackException}) goes to the panel's handler as the study's own message; anything
 * else to the thread's uncaught-exception handler (the workbench's crash guard).
 */
final class StudyRun extends JPanel {

    private static final long serialVersionUID = 1L;

    /**
     * The work, run in the worker.
     *
     * @param <T> what it gives
     */
    @FunctionalInterface
    interface Task<T> {
        /**
         * @param progress where to report steps and learn of Cancel
         * @return the result
         */
        T run(Progress progress);
    }

    private final JButton run;
    private final JButton cancel;
    private final JProgressBar progress = new JProgressBar(0, 100);
    private final JLabel status = new JLabel(" ");
    private SwingWorker<?, Void> worker;

    /**
     * @param prefix  the panel's name prefix (components are named {@code prefix.run}, {@code prefix.cancel},
     *                {@code prefix.progress}, {@code prefix.status})
     * @param runText the Run button's text
     * @param onRun   what Run does
     */
    StudyRun(String prefix, String runText, Runnable onRun) {
        super(new FlowLayout(FlowLayout.LEFT, UIScale.scale(6), UIScale.scale(4)));
        run = new JButton(runText);
        cancel = new JButton(Messages.get("field.cancel"));
        run.setName(prefix + ".run");
        cancel.setName(prefix + ".cancel");
        progress.setName(prefix + ".progress");
        status.setName(prefix + ".status");
        cancel.setEnabled(false);
        run.addActionListener(e -> onRun.run());
        cancel.addActionListener(e -> cancel());
        add(run);
        add(cancel);
        add(progress);
        add(status);
    }

    /**
     * Starts the work, stopping any still under way (its results are dropped).
     *
     * @param <T>     what the work gives
     * @param task    the work
     * @param done    receives the result on the event thread
     * @param refused receives a refusal on the event thread
     */
    <T> void start(Task<T> task, Consumer<T> done, Consumer<FinstackException> refused) {
        if (worker != null && !worker.isDone()) {
            worker.cancel(true);
        }
        SwingWorker<T, Void> w = new SwingWorker<>() {
            @Override
            protected T doInBackground() {
                return task.run(new Progress() {
                    @Override
                    public void step(int stepsDone, int total) {
                        setProgress(Math.min(100, stepsDone * 100 / Math.max(1, total)));
                    }

                    @Override
                    public boolean cancelled() {
                        return isCancelled();
                    }
                });
            }

            @Override
            protected void done() {
                if (worker != this) {
                    return;
                }
                running(false);
                if (isCancelled()) {
                    stopped();
                    return;
                }
                try {
                    T result = get();
                    progress.setValue(100);
                    status.setText(Messages.get("field.status.done"));
                    done.accept(result);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (CancellationException e) {
                    stopped();
                } catch (ExecutionException e) {
                    progress.setValue(0);
                    if (e.getCause() instanceof CancellationException) {
                        stopped();
                    } else if (e.getCause() instanceof FinstackException f) {
                        status.setText(Messages.get("field.status.refused"));
                        refused.accept(f);
                    } else {
                        status.setText(" ");
                        Thread t = Thread.currentThread();
                        t.getUncaughtExceptionHandler().uncaughtException(t, e.getCause());
                    }
                }
            }
        };
        w.addPropertyChangeListener(e -> {
            if ("progress".equals(e.getPropertyName()) && worker == w) {
                progress.setValue((Integer) e.getNewValue());
            }
        });
        worker = w;
        progress.setValue(0);
        status.setText(Messages.get("field.status.working"));
        running(true);
        w.execute();
    }

    /** Stops the work under way, if any. */
    void cancel() {
        if (worker != null && !worker.isDone()) {
            worker.cancel(true);
        }
    }

    /** @return whether work is under way */
    boolean running() {
        return worker != null && !worker.isDone();
    }

    private void stopped() {
        progress.setValue(0);
        status.setText(Messages.get("field.status.cancelled"));
    }

    private void running(boolean on) {
        run.setEnabled(!on);
        cancel.setEnabled(on);
    }
}
