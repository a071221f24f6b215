package org.finstack.cli;

import java.io.PrintWriter;
import org.finstack.core.FinstackException;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code finstack} command: rates coils from case files. Errors in the input print one line
 * naming the field and the reason and exit with status 2; no stack trace reaches the user.
 */
@Command(name = "finstack", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        description = "Rates and compares plate-fin-and-tube refrigeration coils.",
        subcommands = {RateCommand.class, AirCommand.class, FluidCommand.class, BenchCommand.class,
                FoulingCommand.class, FrostCommand.class})
public final class Main implements Runnable {

    /** Exit status for bad input. */
    public static final int EXIT_INPUT = 2;
    /** Exit status for an internal failure. */
    public static final int EXIT_INTERNAL = 1;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    /**
     * @param args command-line arguments
     */
    public static void main(String[] args) {
        System.exit(run(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
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

    @Override
    public void run() {
        PrintWriter out = spec.commandLine().getOut();
        out.println("Finstack rates plate-fin-and-tube coils. Rate a case file with:");
        out.println("  java -jar target/finstack.jar rate examples/<case>.json");
        out.println("See 'java -jar target/finstack.jar --help' for every command.");
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
