package org.finstack.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.finstack.coil.CoilCase;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.study.Conditions;
import org.finstack.study.Constraints;
import org.finstack.study.Option;
import org.finstack.study.Overrides;
import org.finstack.study.Project;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Project files: they read back exactly as written, saving is atomic and keeps the previous file
 * as NAME.bak, damaged and newer files are refused with the file left untouched, and the parts
 * of any case file can be pasted in. The demo project is the examples' case files.
 */
class ProjectFilesTest {

    private static final Path EXAMPLES = Path.of("examples");
    private static final Path DEMO = EXAMPLES.resolve("projects").resolve("otterby-condenser-options.finstack.json");

    @TempDir
    Path dir;

    @Test
    void demoProjectIsTheExampleCaseFiles() {
        Project p = ProjectFiles.read(DEMO);
        CoilCase existing = CaseFiles.read(EXAMPLES.resolve("otterby-rooftop-condenser.json"));
        CoilCase candidate = CaseFiles.read(EXAMPLES.resolve("otterby-condenser-candidate-4row.json"));
        assertThat(p.caseOf(0)).isEqualTo(existing);
        assertThat(p.caseOf(1)).isEqualTo(candidate);
        assertThat(p.isExisting(0)).isTrue();
        assertThat(p.constraints().fanCurve()).hasSize(3);
        assertThat(p.constraints().requiredCapacity()).isEqualTo(7000.0);
    }

    @Test
    void roundTripKeepsEveryValueExactly() throws IOException {
        Project p = ProjectFiles.read(DEMO);
        CoilCase cooler = CaseFiles.read(EXAMPLES.resolve("otterby-cooler-evaporator.json"));
        Project more = new Project(1, p.name(), p.conditions(), p.existing(),
                List.of(p.options().get(0), new Option("cooler coil", cooler.coil(),
                        new Overrides(cooler.air(), cooler.refrigerant(), cooler.fouling()))),
                p.constraints(), "notes with \"quotes\" and a line\nbreak");
        Path f = dir.resolve("p.finstack.json");
        ProjectFiles.write(f, more);
        assertThat(ProjectFiles.read(f)).isEqualTo(more);
        String text = Files.readString(f);
        // quantities are written as "number unit" in SI
        assertThat(text).contains("\"tubeOuterDiameter\" : \"9.52 mm\"").contains("\"inletTemperature\" : \"32 °C\"");
    }

    @Test
    void saveKeepsThePreviousFileAsBak() throws IOException {
        Project p = ProjectFiles.read(DEMO);
        Path f = dir.resolve("site.finstack.json");
        ProjectFiles.write(f, p);
        assertThat(AtomicFiles.backupOf(f)).doesNotExist();
        byte[] first = Files.readAllBytes(f);
        Project renamed = p.withName("renamed");
        ProjectFiles.write(f, renamed);
        assertThat(Files.readAllBytes(AtomicFiles.backupOf(f))).isEqualTo(first);
        assertThat(ProjectFiles.read(f).name()).isEqualTo("renamed");
        try (var s = Files.list(dir)) {
            assertThat(s.map(x -> x.getFileName().toString())).containsExactlyInAnyOrder("site.finstack.json",
                    "site.finstack.json.bak");
        }
    }

    @Test
    void damagedFileIsRefusedAndLeftUntouched() throws IOException {
        Path f = dir.resolve("broken.finstack.json");
        String text = Files.readString(DEMO).substring(0, 400);
        Files.writeString(f, text);
        assertThatThrownBy(() -> ProjectFiles.read(f)).isInstanceOf(InputException.class)
                .satisfies(e -> assertThat(((InputException) e).msg()).isEqualTo(Msg.MALFORMED_FILE))
                .hasMessageContaining("broken.finstack.json");
        assertThat(Files.readString(f)).isEqualTo(text);
    }

    @Test
    void newerVersionIsRefusedAndLeftUntouched() throws IOException {
        Path f = dir.resolve("future.finstack.json");
        String text = Files.readString(DEMO).replace("\"version\": 1", "\"version\": 2");
        Files.writeString(f, text);
        assertThatThrownBy(() -> ProjectFiles.read(f)).isInstanceOf(InputException.class)
                .hasMessage("version: " + Msg.NEWER_VERSION.format(2, 1));
        assertThat(Files.readString(f, StandardCharsets.UTF_8)).isEqualTo(text);
    }

    @Test
    void partsOfACaseFileArePastedIn() throws IOException {
        String us = Files.readString(EXAMPLES.resolve("marrowfield-freezer-evaporator-us.json"));
        // cut the case file's coil, air and refrigerant objects out as text and paste them into a project
        String coil = object(us, "\"coil\"");
        String air = object(us, "\"air\"");
        String refrigerant = object(us, "\"refrigerant\"");
        String project = "{ \"version\": 1, \"name\": \"pasted\", \"conditions\": { \"air\": " + air
                + ", \"refrigerant\": " + refrigerant + " }, \"options\": [ { \"name\": \"F-1\", \"coil\": " + coil
                + " } ] }";
        Project p = ProjectFiles.parse(project, "pasted.finstack.json");
        assertThat(p.caseOf(0)).isEqualTo(CaseFiles.read(EXAMPLES.resolve("marrowfield-freezer-evaporator-us.json")));
        assertThat(p.existing()).isNull();
        assertThat(p.conditions()).isEqualTo(Conditions.of(p.caseOf(0)));
        assertThat(p.constraints()).isEqualTo(Constraints.NONE);
    }

    @Test
    void badValuesNameTheirField() {
        String text = "{ \"version\": 1, \"name\": \"x\", \"conditions\": { \"air\": { \"inletTemperature\": \"32 C\","
                + " \"faceVelocity\": \"2 m/s\" }, \"refrigerant\": { \"fluid\": \"R134a\", \"duty\": \"condenser\","
                + " \"saturationTemperature\": \"45 C\", \"insideCoefficient\": \"2500 W/(m2 K)\" } },"
                + " \"options\": [ { \"name\": \"a\", \"coil\": { \"tubeOuterDiameter\": \"9.52 mm\" } } ] }";
        assertThatThrownBy(() -> ProjectFiles.parse(text, "x")).isInstanceOf(InputException.class)
                .satisfies(e -> assertThat(((InputException) e).field()).startsWith("options[0].coil."));
        String unknown = text.replace("\"notes\"", "").replace("\"options\":", "\"optoins\":");
        assertThatThrownBy(() -> ProjectFiles.parse(unknown, "x")).isInstanceOf(InputException.class)
                .hasMessageStartingWith("optoins:");
    }

    @Test
    void failedSaveLeavesTheOldFile() throws IOException {
        Path f = dir.resolve("keep.finstack.json");
        ProjectFiles.write(f, ProjectFiles.read(DEMO));
        byte[] before = Files.readAllBytes(f);
        Path blocked = dir.resolve("no-such-folder-file").resolve("x.finstack.json");
        Files.writeString(dir.resolve("no-such-folder-file"), "a file where a folder should be");
        assertThatThrownBy(() -> ProjectFiles.write(blocked, ProjectFiles.read(DEMO)))
                .isInstanceOf(java.io.UncheckedIOException.class);
        assertThat(Files.readAllBytes(f)).isEqualTo(before);
    }

    /** The JSON object that follows a key in a case file (balanced braces). */
    private static String object(String text, String key) {
        int start = text.indexOf('{', text.indexOf(key));
        int depth = 0;
        for (int i = start; i < text.length(); i++) {
            char ch = text.charAt(i);
            depth += ch == '{' ? 1 : ch == '}' ? -1 : 0;
            if (depth == 0) {
                return text.substring(start, i + 1);
            }
        }
        throw new AssertionError("unbalanced " + key);
    }
}
