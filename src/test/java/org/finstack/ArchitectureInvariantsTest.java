package org.finstack;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Invariants of the code's shape (the project's design notes): a package imports only packages
 * to its left in the layer order, no Swing or AWT outside {@code org.finstack.ui}, and every
 * package has its package-info.
 */
class ArchitectureInvariantsTest {

    private static final Path MAIN = Path.of("src/main/java/org/finstack");

    /** Layer rank of each top-level package; a package may import only lower ranks and itself. */
    private static final Map<String, Integer> RANK = Map.ofEntries(
            Map.entry("core", 0), Map.entry("units", 1),
            Map.entry("material", 2), Map.entry("fluid", 2), Map.entry("geometry", 3),
            Map.entry("airside", 4), Map.entry("tubeside", 4), Map.entry("exchanger", 4),
            Map.entry("coil", 6), Map.entry("study", 7), Map.entry("io", 8), Map.entry("report", 9),
            Map.entry("ui", 10), Map.entry("cli", 11));

    private static final Pattern IMPORT = Pattern.compile("^import\\s+(static\\s+)?org\\.finstack\\.(\\w+)",
            Pattern.MULTILINE);

    @Test
    void importsPointOnlyTowardsThePhysics() throws IOException {
        List<String> backward = new ArrayList<>();
        for (Path f : sources()) {
            String own = topPackage(f);
            assertThat(RANK).as("layer rank of package %s (add it to RANK)", own).containsKey(own);
            Matcher m = IMPORT.matcher(Files.readString(f));
            while (m.find()) {
                String used = m.group(2);
                if (!used.equals(own) && RANK.getOrDefault(used, 99) >= RANK.get(own)) {
                    backward.add(MAIN.relativize(f) + " imports org.finstack." + used);
                }
            }
        }
        assertThat(backward).as("imports against the layer order").isEmpty();
    }

    @Test
    void noSwingOrAwtOutsideUi() throws IOException {
        List<String> offenders = new ArrayList<>();
        for (Path f : sources()) {
            if (!topPackage(f).equals("ui")) {
                String text = Files.readString(f);
                if (text.contains("import javax.swing") || text.contains("import java.awt")) {
                    offenders.add(MAIN.relativize(f).toString());
                }
            }
        }
        assertThat(offenders).isEmpty();
    }

    @Test
    void everyPackageHasPackageInfo() throws IOException {
        List<String> missing = new ArrayList<>();
        try (Stream<Path> dirs = Files.walk(MAIN)) {
            for (Path d : dirs.filter(Files::isDirectory).toList()) {
                boolean hasJava;
                try (Stream<Path> files = Files.list(d)) {
                    hasJava = files.anyMatch(p -> p.toString().endsWith(".java"));
                }
                if (hasJava && !Files.exists(d.resolve("package-info.java"))) {
                    missing.add(MAIN.relativize(d).toString());
                }
            }
        }
        assertThat(missing).isEmpty();
    }

    private static List<Path> sources() throws IOException {
        try (Stream<Path> s = Files.walk(MAIN)) {
            return s.filter(p -> p.toString().endsWith(".java")).toList();
        }
    }

    private static String topPackage(Path f) {
        return MAIN.relativize(f).getName(0).toString();
    }
}
