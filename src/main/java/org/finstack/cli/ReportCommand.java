package org.finstack.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
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
 */
@Command(name = "report", mixinStandardHelpOptions = true,
        description = "Writes the one-page summary of a project's comparison as PDF and/or HTML.")
final class ReportCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PROJECT", description = "project file (*.finstack.json)")
    private Path projectFile;

    @Option(names = "--out", paramLabel = "PDF", description = "PDF file to write")
    private Path pdf;

    @Option(names = "--html", paramLabel = "HTML", description = "HTML file to write")
    private Path html;

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
        if (pdf == null && html == null) {
            throw new InputException("--out", Msg.EITHER_REQUIRED, "--out FILE.pdf", "--html FILE.html");
        }
        var system = Output.system(units);
        Project project = ProjectFiles.read(projectFile);
        Summary s = ProjectReport.summary(project, CompareCommand.basis(project, designTemperature),
                band.settings(), system, Progress.NONE);
        PrintWriter out = spec.commandLine().getOut();
        if (pdf != null) {
            ProjectReport.write(s, pdf, ProjectReport.Kind.PDF);
            out.println("wrote " + pdf);
        }
        if (html != null) {
            ProjectReport.write(s, html, ProjectReport.Kind.HTML);
            out.println("wrote " + html);
        }
        return 0;
    }
}
