package org.finstack.ui;

import java.awt.Component;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import java.util.function.Supplier;
import javax.swing.JOptionPane;
import javax.swing.SwingUtilities;
import org.finstack.io.ProjectFiles;
import org.finstack.study.Project;

/**
 * The default handler of exceptions nobody caught: it saves a recovery copy of the project as it
 * stands (the edits are never lost), leaves the window open and tells the user where the copy is.
 */
final class CrashGuard implements Thread.UncaughtExceptionHandler {

    private final Supplier<Project> project;
    private final Supplier<Component> parent;
    private final Path folder;

    /**
     * @param project the latest project, readable from any thread
     * @param parent  the window to show the message over
     * @param folder  where recovery copies go
     */
    CrashGuard(Supplier<Project> project, Supplier<Component> parent, Path folder) {
        this.project = project;
        this.parent = parent;
        this.folder = folder;
    }

    /** @return the usual folder for recovery copies: {@code ~/.finstack/recovered} */
    static Path defaultFolder() {
        return Path.of(System.getProperty("user.home"), ".finstack", "recovered");
    }

    @Override
    public void uncaughtException(Thread t, Throwable e) {
        String where;
        try {
            Path file = folder.resolve("recovered-" + LocalDateTime.now().format(
                    DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss", Locale.ROOT)) + ProjectFiles.EXTENSION);
            ProjectFiles.write(file, project.get());
            where = file.toString();
        } catch (RuntimeException saveFailure) {
            where = Messages.format("crash.notSaved", saveFailure.getMessage());
        }
        String text = Messages.format("crash.message", e.getClass().getSimpleName(),
                String.valueOf(e.getMessage()), where);
        System.err.println("finstack: " + text);
        Runnable show = () -> JOptionPane.showMessageDialog(parent.get(), text, Messages.get("app.title"),
                JOptionPane.ERROR_MESSAGE);
        if (SwingUtilities.isEventDispatchThread()) {
            show.run();
        } else {
            SwingUtilities.invokeLater(show);
        }
    }
}
