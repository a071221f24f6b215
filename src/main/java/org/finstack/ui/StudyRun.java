package org.finstack.ui;

import com.formdev.flatlaf.util.UIScale;
import java.awt.Color;
import java.awt.FlowLayout;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.SwingWorker;
import org.finstack.core.FinstackException;
import org.finstack.study.Progress;

/**
 * A Run button, a Cancel button, a progress bar and a one-line status for a study that runs in a
 * {@link SwingWorker}, never on the event thread. The study sees a {@link Progress} whose
 * cancellation is the worker's; Cancel stops it between its steps and drops its result. A refusal
 * ({@link FinstackException}) goes to the panel's handler as the study's own message; anything
 * else to the thread's uncaught-exception handler (the workbench's crash guard). A run replaced by
 * a new one is stopped and reports nothing.
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
    private final Color normal = status.getForeground();
    private boolean progressWhileIdle = true;
    private Runnable onCancelled = () -> { };
    private SwingWorker<?, Void> worker;

    /**
     * A run whose status stands on the same line, after the progress bar.
     *
     * @param prefix  the panel's name prefix (components are named {@code prefix.run}, {@code prefix.cancel},
     *                {@code prefix.progress}, {@code prefix.status})
     * @param runText the Run button's text
     * @param onRun   what Run does
     */
    StudyRun(String prefix, String runText, Runnable onRun) {
        this(prefix, runText, Messages.get("field.cancel"), onRun);
        add(status);
    }

    /**
     * A run whose status line the panel places itself ({@link #status()}).
     *
     * @param prefix     the panel's name prefix (components are named {@code prefix.run}, {@code prefix.cancel},
     *                   {@code prefix.progress}, {@code prefix.status})
     * @param runText    the Run button's text
     * @param cancelText the Cancel button's text
     * @param onRun      what Run does
     */
    StudyRun(String prefix, String runText, String cancelText, Runnable onRun) {
        super(new FlowLayout(FlowLayout.LEFT, UIScale.scale(6), UIScale.scale(4)));
        run = new JButton(runText);
        cancel = new JButton(cancelText);
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
    }

    /**
     * @param components put before the Run button, in this order (e.g. a field the study reads)
     * @return this
     */
    StudyRun before(JComponent... components) {
        for (int i = 0; i < components.length; i++) {
            add(components[i], i);
        }
        return this;
    }

    /**
     * @param components put after the progress bar (and the status, when it stands on this line), in this order
     * @return this
     */
    StudyRun after(JComponent... components) {
        for (JComponent c : components) {
            add(c);
        }
        return this;
    }

    /**
     * Shows the progress bar only while work is under way.
     *
     * @return this
     */
    StudyRun progressOnlyWhileRunning() {
        progressWhileIdle = false;
        progress.setVisible(running());
        return this;
    }

    /**
     * @param then what to do on the event thread once Cancel has stopped the work (after the status
     *             says so), e.g. clear the result shown and say so in the panel's words
     * @return this
     */
    StudyRun whenCancelled(Runnable then) {
        onCancelled = then;
        return this;
    }

    /** @return the one-line status ({@code prefix.status}) */
    JLabel status() {
        return status;
    }

    /**
     * Says how things stand, in the status line's normal colour.
     *
     * @param text the line
     */
    void say(String text) {
        status.setForeground(normal);
        status.setText(text);
    }

    /**
     * Tells of a problem, in the theme's error colour.
     *
     * @param text the line
     */
    void problem(String text) {
        status.setForeground(Theme.color("Finstack.error", normal));
        status.setText(text);
    }

    /**
     * Starts the work, stopping any still under way (its results are dropped), the status saying
     * it is working.
     *
     * @param <T>     what the work gives
     * @param task    the work
     * @param done    receives the result on the event thread
     * @param refused receives a refusal on the event thread
     */
    <T> void start(Task<T> task, Consumer<T> done, Consumer<FinstackException> refused) {
        start(Messages.get("field.status.working"), task, done, refused);
    }

    /**
     * Starts the work, stopping any still under way (its results are dropped).
     *
     * @param <T>     what the work gives
     * @param working what the status says while it runs
     * @param task    the work
     * @param done    receives the result on the event thread
     * @param refused receives a refusal on the event thread
     */
    <T> void start(String working, Task<T> task, Consumer<T> done, Consumer<FinstackException> refused) {
        SwingWorker<?, Void> replaced = worker;
        worker = null;
        if (replaced != null && !replaced.isDone()) {
            replaced.cancel(true);
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
                worker = null;
                running(false);
                try {
                    T result = get();
                    progress.setValue(100);
                    say(Messages.get("field.status.done"));
                    try {
                        done.accept(result);
                    } catch (FinstackException f) {
                        // a result the panel cannot show (a value it cannot write) is refused in its
                        // own words, not sent to the crash guard
                        say(Messages.get("field.status.refused"));
                        refused.accept(f);
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    progress.setValue(0);
                    if (e.getCause() instanceof FinstackException f) {
                        say(Messages.get("field.status.refused"));
                        refused.accept(f);
                    } else {
                        say(" ");
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
        say(working);
        running(true);
        w.execute();
    }

    /**
     * Stops the work under way, if any, even when it has finished but its result is still to be
     * shown: nothing of it is shown.
     */
    void cancel() {
        if (worker == null) {
            return;
        }
        SwingWorker<?, Void> stopped = worker;
        worker = null;
        stopped.cancel(true);
        running(false);
        progress.setValue(0);
        say(Messages.get("field.status.cancelled"));
        onCancelled.run();
    }

    /** @return whether work is under way (its result still to be shown) */
    boolean running() {
        return worker != null;
    }

    private void running(boolean on) {
        run.setEnabled(!on);
        cancel.setEnabled(on);
        progress.setVisible(on || progressWhileIdle);
    }
}
