package org.finstack.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Objects;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.study.Progress;
import org.finstack.study.Project;
import org.finstack.study.compare.BandSettings;
import org.finstack.study.compare.Comparison;
import org.finstack.study.compare.DesignBasis;
import org.finstack.units.UnitSystem;

/**
 * The one-page report of a project, as the {@code report} command and the workbench's export
 * both make it: the project's options compared ({@link Comparison}) on a design basis, with or
 * without capacity bands, summarised ({@link Summary}) and written as PDF or HTML, atomically.
 */
public final class ProjectReport {

    /** The file formats of the report. */
    public enum Kind {
        /** One A4 page ({@link PdfReport}). */
        PDF,
        /** One HTML page ({@link HtmlReport}). */
        HTML
    }

    private ProjectReport() {
    }

    /**
     * Compares a project's options and summarises the comparison.
     *
     * @param project  the project
     * @param basis    the design-pressure and charge basis
     * @param band     whether and how to rate each option's capacity band
     * @param units    the unit system of the summary
     * @param progress progress sink, checked for cancellation
     * @return the summary
     */
    public static Summary summary(Project project, DesignBasis basis, BandSettings band, UnitSystem units,
            Progress progress) {
        Objects.requireNonNull(units, "units");
        return Summary.of(Comparison.of(project, basis, band, progress), units);
    }

    /**
     * Writes a summary atomically (the previous file kept as {@code NAME.bak}).
     *
     * @param summary the summary
     * @param file    where to write
     * @param kind    the format
     * @throws InputException (the file's path, {@link Msg#FILE_UNWRITABLE}) when the file cannot be
     *                        written, e.g. the path is a folder (the old file is then unchanged)
     */
    public static void write(Summary summary, Path file, Kind kind) {
        Objects.requireNonNull(kind, "kind");
        if (Files.isDirectory(file)) {
            throw new InputException(file.toString(), Msg.FILE_UNWRITABLE, file, "it is a folder; give a file name");
        }
        try {
            switch (kind) {
                case PDF -> PdfReport.write(summary, file);
                case HTML -> HtmlReport.write(summary, file);
                default -> throw new IllegalArgumentException("unknown report kind " + kind);
            }
        } catch (UncheckedIOException e) {
            IOException cause = e.getCause();
            String reason = cause.getMessage() == null ? cause.getClass().getSimpleName() : cause.getMessage();
            throw new InputException(file.toString(), Msg.FILE_UNWRITABLE, file, reason);
        }
    }
}
