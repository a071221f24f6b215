package org.finstack.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.io.ProjectFiles;
import org.finstack.study.Project;
import org.finstack.ui.Workbench;
import org.finstack.units.UnitSystem;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code finstack} command: rates coils from case files ({@code rate}) and, with no command
 * or with {@code workbench}, opens the desktop workbench. Errors in the input print one line
 * naming the field and the reason and exit with status 2; no stack trace reaches the user.
 */
@Command(name = "finstack", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        description = "Rates and compares plate-fin-and-tube refrigeration coils.",
        subcommands = {RateCommand.class, AirCommand.class, FluidCommand.class, BenchCommand.class,
            CompareCommand.class, SearchCommand.class, SensitivityCommand.class, SweepCommand.class,
            ReportCommand.class, DiagnoseCommand.class, FoulingCommand.class, FrostCommand.class,
            Main.WorkbenchCommand.class})
public final class Main implements Callable<Integer> {

    /** Exit status for bad input. */
    public static final int EXIT_INPUT = 2;
    /** Exit status for an internal failure. */
    public static final int EXIT_INTERNAL = 1;
    /** Returned when the workbench window opened: the program keeps running until it is closed. */
    static final int STAYS_OPEN = Workbench.STAYS_OPEN;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    /**
     * @param args command-line arguments
     */
    public static void main(String[] args) {
        int code = run(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true));
        if (code != STAYS_OPEN) {
            System.exit(code);
        }
    }

    /**
     * Runs the command line with the given streams (for tests and embedding).
     *
     * @param args arguments
     * @param out  standard output
     * @param err  standard error
     * @return exit status
     */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new Main());
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler((ex, cmd, parsed) -> {
            if (ex instanceof FinstackException fe) {
                err.println("finstack: " + fe.getMessage());
                return EXIT_INPUT;
            }
            err.println("finstack: internal error (" + ex.getClass().getSimpleName() + "): " + ex.getMessage()
                    + " - please report it with the input that caused it");
            return EXIT_INTERNAL;
        });
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("finstack: " + ex.getMessage());
            err.println("Try 'finstack " + (ex.getCommandLine().getCommandName().equals("finstack") ? ""
                    : ex.getCommandLine().getCommandName() + " ") + "--help'.");
            return EXIT_INPUT;
        });
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }

    /**
     * With no command, opens the workbench on the demo project; without a display, rates the demo
     * project's existing coil on the command line instead.
     */
    @Override
    public Integer call() {
        return startWorkbench(null, spec.commandLine().getOut(), spec.commandLine().getErr());
    }

    /**
     * Starts the workbench through its entry class; without a display, says so and rates the
     * project's first option (the existing coil where there is one) as {@code rate} would.
     *
     * @param project a project file, or null for the demo project
     * @param out     standard output
     * @param err     standard error
     * @return the workbench's status: {@link #STAYS_OPEN} while its window is open, 0 after the
     *         rating without a display
     */
    static int startWorkbench(Path project, PrintWriter out, PrintWriter err) {
        if (Workbench.displayAvailable()) {
            return Workbench.start(project, out, err);
        }
        Project p = project == null ? Workbench.demo() : ProjectFiles.read(project);
        if (p.allOptions().isEmpty()) {
            throw new InputException(project == null ? "demo" : project.toString(), Msg.IMPOSSIBLE,
                    "the project has no coil to rate");
        }
        out.println("finstack: no display here, so the workbench cannot open; the command line rates \""
                + p.allOptions().get(0).name() + "\" of " + (project == null ? "the demo project" : project)
                + " instead (rate a case of your own with: java -jar target/finstack.jar rate CASE.json)");
        out.println();
        CoilCase c = p.caseOf(0);
        RateCommand.table(out, c, CoilModels.rate(c), UnitSystem.SI);
        out.flush();
        return 0;
    }

    /** {@code finstack workbench [PROJECT]}: opens the desktop workbench. */
    @Command(name = "workbench", mixinStandardHelpOptions = true,
            description = "Opens the desktop workbench on a project file, or on the demo project.")
    static final class WorkbenchCommand implements Callable<Integer> {

        @CommandLine.Spec
        private CommandLine.Model.CommandSpec spec;

        @CommandLine.Parameters(index = "0", arity = "0..1", paramLabel = "PROJECT",
                description = "project file (*.finstack.json); the demo project when omitted")
        private Path project;

        @Override
        public Integer call() {
            return startWorkbench(project, spec.commandLine().getOut(), spec.commandLine().getErr());
        }
    }

    /** Reports the version from the jar's manifest. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"finstack " + (v == null ? "(development build)" : v)};
        }
    }
}
