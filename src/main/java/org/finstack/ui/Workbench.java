package org.finstack.ui;

import java.awt.GraphicsEnvironment;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import javax.swing.SwingUtilities;
import org.finstack.core.FinstackException;
import org.finstack.io.ProjectFiles;
import org.finstack.study.Project;

/**
 * Starts the workbench: installs the theme, the crash guard and the window, on the event thread.
 * Without a display it says so in one line and points to the command line.
 */
public final class Workbench {

    /** Class-path location of the demo project (built from the examples). */
    public static final String DEMO_RESOURCE = "/examples/projects/otterby-condenser-options.finstack.json";

    /** Returned by {@link #start} when the window is open and the program must keep running. */
    public static final int STAYS_OPEN = -1;

    private Workbench() {
    }

    /**
     * Starts the workbench from the command line.
     *
     * @param project a project file to open, or null for the demo project
     * @param out     standard output
     * @param err     standard error
     * @return {@link #STAYS_OPEN} when the window opens; 2 for a file refused
     * @throws IllegalStateException without a display (ask {@link #displayAvailable()} first)
     */
    public static int start(Path project, PrintWriter out, PrintWriter err) {
        if (!displayAvailable()) {
            throw new IllegalStateException("no display: the workbench cannot open");
        }
        Project p;
        try {
            p = project == null ? demo() : ProjectFiles.read(project);
        } catch (FinstackException e) {
            err.println("finstack: " + e.getMessage());
            err.flush();
            return 2;
        }
        SwingUtilities.invokeLater(() -> open(p, project, UiPreferences.user(), true));
        return STAYS_OPEN;
    }

    /** @return whether a window can open here (false on a machine without a display) */
    public static boolean displayAvailable() {
        return !GraphicsEnvironment.isHeadless();
    }

    /** @return the demo project bundled with the program */
    public static Project demo() {
        try (InputStream in = Workbench.class.getResourceAsStream(DEMO_RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("demo project missing from the class path: " + DEMO_RESOURCE);
            }
            return ProjectFiles.parse(new String(in.readAllBytes(), StandardCharsets.UTF_8), "demo project");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Opens a workbench window (call on the event thread).
     *
     * @param project     the project
     * @param file        its file, or null
     * @param prefs       where the window keeps its state
     * @param exitOnClose whether closing the window ends the program
     * @return the window, shown
     */
    public static WorkbenchFrame open(Project project, Path file, UiPreferences prefs, boolean exitOnClose) {
        prefs.theme().install();
        WorkbenchFrame[] holder = new WorkbenchFrame[1];
        WorkbenchFrame f = new WorkbenchFrame(project, file, prefs, exitOnClose);
        holder[0] = f;
        Thread.setDefaultUncaughtExceptionHandler(new CrashGuard(() -> holder[0].model().latest(), () -> holder[0],
                CrashGuard.defaultFolder()));
        f.setVisible(true);
        return f;
    }
}
