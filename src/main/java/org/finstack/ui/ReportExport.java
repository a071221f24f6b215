package org.finstack.ui;

import com.formdev.flatlaf.util.UIScale;
import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Dialog;
import java.awt.FlowLayout;
import java.awt.Window;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.io.File;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Consumer;
import java.util.function.Supplier;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JDialog;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import javax.swing.WindowConstants;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.finstack.report.ProjectReport;
import org.finstack.report.Summary;
import org.finstack.study.Progress;
import org.finstack.study.Project;
import org.finstack.study.compare.BandSettings;
import org.finstack.study.compare.DesignBasis;
import org.finstack.units.UnitSystem;

/**
 * File &gt; Export report: the one-page report of the open project, made as the {@code report}
 * command makes it ({@link ProjectReport}, on the default design basis, with the capacity bands
 * when the toolbar's toggle is on), written as PDF or HTML in a worker, atomically, with the
 * comparison's progress and a Cancel beside it; after Cancel or a failure (told in a dialog with
 * the reason) the file on disk is unchanged.
 */
final class ReportExport {

    private ReportExport() {
    }

    /**
     * @param parent the window dialogs belong to
     * @param model  the open project
     * @param band   the capacity band's settings in force
     * @param status receives what happened, in one line
     * @return the menu item that chooses a file and writes the report
     */
    static JMenuItem menuItem(Component parent, ProjectModel model, Supplier<BandSettings> band,
            Consumer<String> status) {
        JMenuItem item = new JMenuItem(Messages.get("menu.file.export"));
        item.setName("menu.file.export");
        item.addActionListener(e -> choose(parent, model, band.get(), status));
        return item;
    }

    private static void choose(Component parent, ProjectModel model, BandSettings band, Consumer<String> status) {
        JFileChooser fc = new JFileChooser(model.file() == null ? null : model.file().toAbsolutePath().getParent()
                .toFile());
        FileNameExtensionFilter pdf = new FileNameExtensionFilter(Messages.get("menu.file.export.pdf"), "pdf");
        FileNameExtensionFilter html = new FileNameExtensionFilter(Messages.get("menu.file.export.html"), "html",
                "htm");
        fc.addChoosableFileFilter(pdf);
        fc.addChoosableFileFilter(html);
        fc.setFileFilter(pdf);
        fc.setSelectedFile(new File(model.project().name().replaceAll("[^A-Za-z0-9._-]+", "-")
                .toLowerCase(Locale.ROOT) + "-report.pdf"));
        if (fc.showSaveDialog(parent) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path file = fc.getSelectedFile().toPath();
        ProjectReport.Kind kind = kindOf(file, fc.getFileFilter() == html ? ProjectReport.Kind.HTML
                : ProjectReport.Kind.PDF);
        if (!hasExtension(file)) {
            file = file.resolveSibling(file.getFileName() + (kind == ProjectReport.Kind.HTML ? ".html" : ".pdf"));
        }
        write(parent, model.project(), model.units(), band, file, kind, status);
    }

    /**
     * @param file     the file chosen
     * @param fallback the format when the name does not say
     * @return the format its name asks for
     */
    static ProjectReport.Kind kindOf(Path file, ProjectReport.Kind fallback) {
        String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (n.endsWith(".html") || n.endsWith(".htm")) {
            return ProjectReport.Kind.HTML;
        }
        return n.endsWith(".pdf") ? ProjectReport.Kind.PDF : fallback;
    }

    private static boolean hasExtension(Path file) {
        String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
        return n.endsWith(".pdf") || n.endsWith(".html") || n.endsWith(".htm");
    }

    /**
     * Writes the report in a worker, beside a small non-modal window that shows the comparison's
     * progress and offers Cancel ({@code export.progress}, {@code export.cancel}). Cancel, or
     * closing the window, stops the comparison between its options and nothing is written: the
     * file on disk, if any, stays as it was and the status says the export was cancelled. Once the
     * comparison is done the file is written and Cancel is no longer offered, so the file is
     * either written whole or not at all.
     *
     * @param parent  the window the progress and failure dialogs belong to
     * @param project the project
     * @param units   the unit system of the report
     * @param band    the capacity band's settings
     * @param file    where
     * @param kind    the format
     * @param status  receives what happened, in one line
     * @return the worker, started; its result is the file written
     */
    static SwingWorker<Path, Void> write(Component parent, Project project, UnitSystem units, BandSettings band,
            Path file, ProjectReport.Kind kind, Consumer<String> status) {
        AtomicReference<Stage> stage = new AtomicReference<>(Stage.COMPARING);
        JDialog dialog = new JDialog(parent instanceof Window owner ? owner : SwingUtilities.getWindowAncestor(parent),
                Messages.get("menu.file.export.title"), Dialog.ModalityType.MODELESS);
        JProgressBar bar = new JProgressBar(0, 100);
        JButton cancel = new JButton(Messages.get("menu.file.export.cancel"));
        JLabel what = new JLabel(Messages.format("menu.file.export.writing", file.getFileName()));
        SwingWorker<Path, Void> w = new SwingWorker<>() {
            @Override
            protected Path doInBackground() {
                Summary summary = ProjectReport.summary(project, DesignBasis.defaultFor(project.conditions()), band,
                        units, new Progress() {
                            @Override
                            public void step(int done, int total) {
                                setProgress(Math.min(100, done * 100 / Math.max(1, total)));
                            }

                            @Override
                            public boolean cancelled() {
                                return stage.get() == Stage.CANCELLED;
                            }
                        });
                if (!stage.compareAndSet(Stage.COMPARING, Stage.WRITING)) {
                    throw new CancellationException("report export cancelled");
                }
                SwingUtilities.invokeLater(() -> {
                    cancel.setEnabled(false);
                    what.setText(Messages.format("menu.file.export.saving", file.getFileName()));
                });
                ProjectReport.write(summary, file, kind);
                return file;
            }

            @Override
            protected void done() {
                dialog.dispose();
                try {
                    get();
                    status.accept(Messages.format("menu.file.export.written", file));
                } catch (CancellationException e) {
                    status.accept(Messages.format("menu.file.export.cancelled", file.getFileName()));
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    Throwable cause = e.getCause();
                    String reason = cause.getMessage() == null || cause.getMessage().isBlank()
                            ? cause.getClass().getSimpleName() : cause.getMessage();
                    status.accept(Messages.format("menu.file.export.failedShort", file.getFileName()));
                    JOptionPane.showMessageDialog(parent, Messages.format("menu.file.export.failed", file, reason),
                            Messages.get("app.title"), JOptionPane.ERROR_MESSAGE);
                }
            }
        };
        Runnable stop = () -> {
            if (stage.compareAndSet(Stage.COMPARING, Stage.CANCELLED)) {
                w.cancel(false);
            }
        };
        w.addPropertyChangeListener(e -> {
            if ("progress".equals(e.getPropertyName())) {
                bar.setValue((Integer) e.getNewValue());
            }
        });
        bar.setName("export.progress");
        cancel.setName("export.cancel");
        cancel.addActionListener(e -> stop.run());
        dialog.setName("export.dialog");
        dialog.setDefaultCloseOperation(WindowConstants.DO_NOTHING_ON_CLOSE);
        dialog.addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                stop.run();
            }
        });
        JPanel content = new JPanel(new BorderLayout(0, UIScale.scale(8)));
        content.setBorder(BorderFactory.createEmptyBorder(12, 12, 12, 12));
        content.add(what, BorderLayout.NORTH);
        content.add(bar, BorderLayout.CENTER);
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT, 0, 0));
        buttons.add(cancel);
        content.add(buttons, BorderLayout.SOUTH);
        dialog.setContentPane(content);
        dialog.pack();
        dialog.setLocationRelativeTo(parent);
        status.accept(Messages.format("menu.file.export.writing", file.getFileName()));
        dialog.setVisible(true);
        w.execute();
        return w;
    }

    /** How far an export has gone: Cancel is honoured only while the options are being compared. */
    private enum Stage {
        /** The options are being compared; Cancel stops the work. */
        COMPARING,
        /** The file is being written; too late to cancel. */
        WRITING,
        /** Cancelled before anything was written. */
        CANCELLED
    }
}
