package org.finstack.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/**
 * Without a display, {@code java -jar finstack.jar} (no arguments) prints one line pointing to
 * the rate command and exits 0. Run in a separate JVM forced headless, so it holds on any box.
 */
class HeadlessLaunchTest {

    @Test
    void noDisplayPrintsOneLineAndExitsZero() throws Exception {
        for (List<String> args : List.of(List.<String>of(), List.of("workbench"))) {
            List<String> cmd = new java.util.ArrayList<>(List.of(
                    System.getProperty("java.home") + File.separator + "bin" + File.separator + "java",
                    "-Djava.awt.headless=true", "-cp", System.getProperty("java.class.path"), "org.finstack.cli.Main"));
            cmd.addAll(args);
            Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
            assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
            String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            assertThat(p.exitValue()).as(out).isZero();
            assertThat(out.strip().lines()).hasSize(1);
            assertThat(out).contains("no display")
                    .contains("java -jar target/finstack.jar rate examples/otterby-rooftop-condenser.json");
        }
    }
}
