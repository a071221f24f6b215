package org.finstack.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/**
 * Without a display, {@code java -jar finstack.jar} (no arguments, or {@code workbench}) says so
 * and rates the demo project's existing coil on the command line instead, exit status 0. Run in a
 * separate JVM forced headless, so it holds on any box. The capacity is the README's worked
 * example (the same coil), rated by the {@code rate} command in RateCommandTest.
 */
class HeadlessLaunchTest {

    @Test
    void noDisplayRatesTheDemoCoilOnTheCommandLineAndExitsZero() throws Exception {
        for (List<String> args : List.of(List.<String>of(), List.of("workbench"))) {
            List<String> cmd = new java.util.ArrayList<>(List.of(
                    System.getProperty("java.home") + File.separator + "bin" + File.separator + "java",
                    "-Djava.awt.headless=true", "-cp", System.getProperty("java.class.path"), "org.finstack.cli.Main"));
            cmd.addAll(args);
            Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
            assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
            String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            assertThat(p.exitValue()).as(out).isZero();
            assertThat(out.lines().findFirst().orElse("")).contains("no display")
                    .contains("the demo project").contains("java -jar target/finstack.jar rate CASE.json");
            assertThat(out).contains("Rating of 3 rows x 16 tubes").containsPattern("capacity +7\\.054 kW");
        }
    }
}
