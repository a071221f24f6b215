package org.finstack.ui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.Graphics2D;
import java.awt.GraphicsEnvironment;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.UUID;
import java.util.concurrent.Callable;
import java.util.prefs.BackingStoreException;
import java.util.prefs.Preferences;
import javax.imageio.ImageIO;
import org.assertj.swing.edt.FailOnThreadViolationRepaintManager;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.timing.Condition;
import org.assertj.swing.timing.Pause;
import org.assertj.swing.timing.Timeout;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;

/**
 * The workbench GUI tests' common ground: skipped without a display (CI runs them under Xvfb),
 * a repaint manager that fails any Swing access off the event thread, the demo project opened in
 * a 1280 × 820 workbench with its own throw-away preferences node and rated before each test;
 * after each, a check that no rating ran on the event thread, then the window and the preferences
 * removed. Helpers wait for a condition on the event thread and write screenshots to
 * target/screenshots.
 */
abstract class WorkbenchGuiFixture {

    private static final Path SHOTS = Path.of("target", "screenshots");

    /** The workbench under test. */
    protected WorkbenchFrame frame;
    /** AssertJ Swing's handle on {@link #frame}. */
    protected FrameFixture window;
    private Preferences node;

    @BeforeAll
    static void needsDisplay() {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: GUI tests skipped (CI runs them under Xvfb)");
        FailOnThreadViolationRepaintManager.install();
    }

    @BeforeEach
    void open() {
        node = Preferences.userRoot().node("org/finstack/test-" + UUID.randomUUID());
        UiPreferences prefs = new UiPreferences(node);
        frame = GuiActionRunner.execute(() -> Workbench.open(Workbench.demo(), null, prefs, false));
        window = new FrameFixture(frame);
        window.resizeTo(new java.awt.Dimension(1280, 820));
        awaitRated();
    }

    @AfterEach
    void close() throws BackingStoreException {
        if (window != null) {
            assertThat(onEdt(() -> frame.runner().ratingsOnEventThread())).as("ratings run on the event thread")
                    .isZero();
            window.cleanUp();
        }
        if (node != null) {
            node.removeNode();
        }
    }

    /** Waits until the workbench has no rating under way and shows one. */
    protected void awaitRated() {
        awaitCondition("rating finished", () -> !frame.busy() && frame.results().rating() != null);
    }

    /**
     * Waits up to a minute for a condition, asked on the event thread.
     *
     * @param what what is awaited, for the failure message
     * @param test the condition
     */
    protected static void awaitCondition(String what, Callable<Boolean> test) {
        Pause.pause(new Condition(what) {
            @Override
            public boolean test() {
                return onEdt(test);
            }
        }, Timeout.timeout(60_000));
    }

    /**
     * @param <T> what the call gives
     * @param c   a call, run on the event thread
     * @return its result
     */
    protected static <T> T onEdt(Callable<T> c) {
        return GuiActionRunner.execute(c);
    }

    /**
     * Paints the workbench into target/screenshots/{@code name}.png.
     *
     * @param name the file's name without extension
     */
    protected void shot(String name) {
        try {
            Files.createDirectories(SHOTS);
            BufferedImage img = GuiActionRunner.execute(() -> {
                BufferedImage i = new BufferedImage(frame.getRootPane().getWidth(), frame.getRootPane().getHeight(),
                        BufferedImage.TYPE_INT_RGB);
                Graphics2D g = i.createGraphics();
                frame.getRootPane().paint(g);
                g.dispose();
                return i;
            });
            ImageIO.write(img, "png", SHOTS.resolve(name + ".png").toFile());
        } catch (IOException e) {
            throw new AssertionError("cannot write screenshot " + name, e);
        }
    }
}
