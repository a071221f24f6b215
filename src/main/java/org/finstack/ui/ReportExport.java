package org.finstack.ui;

import java.awt.Component;
import java.io.File;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;
import java.util.function.Supplier;
import javax.swing.JFileChooser;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.SwingWorker;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.finstack.report.ProjectReport;
import org.finstack.study.Progress;
import org.finstack.study.Project;
import org.finstack.study.compare.BandSettings;
import org.finstack.study.compare.DesignBasis;
import org.finstack.units.UnitSystem;

/**
 * File &gt; Export report: the one-page report of the open project, made as the {@code report}
 * command makes it ({@link ProjectReport}, on the default design basis, with the capacity bands
 * when the toolbar's toggle is on), written as PDF or HTML in a worker, atomically; a failure is
 * told in a dialog with the reason, and the file on disk is then unchanged.
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
     * Writes the report in a worker.
     *
     * @param parent  the window the failure dialog belongs to
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
        SwingWorker<Path, Void> w = new SwingWorker<>() {
            @Override
            protected Path doInBackground() {
                ProjectReport.write(ProjectReport.summary(project, DesignBasis.defaultFor(project.conditions()), band,
                        units, Progress.NONE), file, kind);
                return file;
            }

            @Override
            protected void done() {
                try {
                    get();
                    status.accept(Messages.format("menu.file.export.written", file));
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
        status.accept(Messages.format("menu.file.export.writing", file.getFileName()));
        w.execute();
        return w;
    }
}
