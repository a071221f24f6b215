package org.finstack.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.io.ProjectFiles;
import org.finstack.report.ProjectReport;
import org.finstack.report.Summary;
import org.finstack.study.Progress;
import org.finstack.study.Project;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code finstack report PROJECT.json --out report.pdf [--html report.html]}: the one-page summary,
 * with each option's capacity band in the table ({@code --samples}, 0 for none) when it fits.
 * {@code --out report.html}, or {@code --out FILE --html} with no file of its own, writes HTML
 * there instead of PDF.
 */
@Command(name = "report", mixinStandardHelpOptions = true,
        description = "Writes the one-page summary of a project's comparison as PDF and/or HTML.")
final class ReportCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PROJECT", description = "project file (*.finstack.json)")
    private Path projectFile;

    @Option(names = "--out", paramLabel = "FILE", description = "file to write: PDF, or HTML when it ends in .html "
            + "or .htm or when --html is given without a file")
    private Path pdf;

    @Option(names = "--html", paramLabel = "HTML", arity = "0..1", fallbackValue = "",
            description = "HTML file to write (beside the PDF of --out); alone, --out is written as HTML")
    private String html;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si",
            description = "units of the summary: si or us (default: ${DEFAULT-VALUE})")
    private String units;

    @Option(names = "--design-temperature", paramLabel = "TEMP",
            description = "highest expected saturation temperature for the design-pressure margin, e.g. \"60 C\"")
    private String designTemperature;

    @Mixin
    private BandOptions band = new BandOptions();

    @Override
    public Integer call() {
        boolean htmlFlagOnly = html != null && html.isEmpty();
        if (pdf == null && (html == null || htmlFlagOnly)) {
            throw new InputException("--out", Msg.EITHER_REQUIRED, "--out FILE.pdf", "--html FILE.html");
        }
        var system = Output.system(units);
        Project project = ProjectFiles.read(projectFile);
        Summary s = ProjectReport.summary(project, CompareCommand.basis(project, designTemperature),
                band.settings(), system, Progress.NONE);
        PrintWriter out = spec.commandLine().getOut();
        if (pdf != null) {
            boolean asHtml = htmlFlagOnly || isHtmlName(pdf);
            ProjectReport.write(s, pdf, asHtml ? ProjectReport.Kind.HTML : ProjectReport.Kind.PDF);
            out.println("wrote " + pdf);
        }
        if (html != null && !htmlFlagOnly) {
            Path file = Path.of(html);
            ProjectReport.write(s, file, ProjectReport.Kind.HTML);
            out.println("wrote " + file);
        }
        return 0;
    }

    private static boolean isHtmlName(Path p) {
        String name = p.getFileName() == null ? "" : p.getFileName().toString().toLowerCase(Locale.ROOT);
        return name.endsWith(".html") || name.endsWith(".htm");
    }
}
