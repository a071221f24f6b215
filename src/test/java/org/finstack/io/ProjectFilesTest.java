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
 * of any case file can be pasted in. The demo project is the examples' case files. The room
 * (version 2) is read with its units, written and read back, and a bad value is one line naming
 * its field; a damaged option is kept with its error and written back verbatim. Unit factors:
 * NIST SP 811 Appendix B.9 (1 ft = 0.3048 m exactly).
 */
class ProjectFilesTest {

    private static final Path EXAMPLES = Path.of("examples");
    private static final Path DEMO = EXAMPLES.resolve("projects").resolve("otterby-condenser-options.finstack.json");
    private static final Path PROPANE = EXAMPLES.resolve("projects").resolve("marrowfield-propane-cooler.finstack.json");
    /** The propane example without its room (invented demo scenario). */
    private static final String ROOMLESS = read(PROPANE).replaceAll(",\\s*\"room\": \\{[^}]*\\}", "");

    private static String read(Path p) {
        try {
            return Files.readString(p);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

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
        String text = Files.readString(DEMO).replace("\"version\": 1", "\"version\": 3");
        Files.writeString(f, text);
        assertThatThrownBy(() -> ProjectFiles.read(f)).isInstanceOf(InputException.class)
                .hasMessage("version: " + Msg.NEWER_VERSION.format(3, 2));
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

    @Test
    void roomIsReadWithItsUnits() {
        // the invented demo room of the propane example
        Project p = ProjectFiles.read(PROPANE);
        assertThat(p.version()).isEqualTo(2);
        assertThat(p.constraints().room()).isEqualTo(new Constraints.Room(180, 60, 1.2, true));
        // units converted at the edge: 6356.6 ft3 = 180.0 m3 (1 ft = 0.3048 m exactly, NIST SP 811 B.9)
        String us = ROOMLESS.replace("\"maxDepth\": \"100 mm\", \"circuits\": 2", "\"maxDepth\": \"100 mm\", \"circuits\": 2, \"room\": { \"volume\": \"1000 ft3\", "
                + "\"floorArea\": \"100 ft2\", \"releaseHeight\": \"4 ft\", \"selfContainedAppliance\": false }");
        Constraints.Room r = ProjectFiles.parse(us, "us").constraints().room();
        assertThat(r.volume()).isCloseTo(1000 * Math.pow(0.3048, 3), org.assertj.core.data.Offset.offset(1e-9));
        assertThat(r.floorArea()).isCloseTo(100 * 0.3048 * 0.3048, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(r.releaseHeight()).isCloseTo(4 * 0.3048, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(r.selfContainedAppliance()).isFalse();
    }

    @Test
    void roomIsWrittenAsVersion2AndReadsBack() throws IOException {
        Project p = ProjectFiles.read(DEMO);
        assertThat(p.version()).isEqualTo(1);
        Path plain = dir.resolve("plain.finstack.json");
        ProjectFiles.write(plain, p);
        // without a room the file keeps version 1, readable by older copies of the program
        assertThat(Files.readString(plain)).contains("\"version\" : 1");
        Project withRoom = p.withConstraints(p.constraints().withRoom(new Constraints.Room(42.5, 17, 2.2, false)));
        Path f = dir.resolve("room.finstack.json");
        ProjectFiles.write(f, withRoom);
        String text = Files.readString(f);
        assertThat(text).contains("\"version\" : 2").contains("\"room\" : {").contains("\"releaseHeight\" : \"2200 mm\"")
                .contains("\"selfContainedAppliance\" : false");
        Project back = ProjectFiles.read(f);
        assertThat(back.constraints()).isEqualTo(withRoom.constraints());
        assertThat(back.version()).isEqualTo(2);
        Project again = ProjectFiles.parse(ProjectFiles.toJson(back), "again");
        assertThat(again).isEqualTo(back);
    }

    /**
     * Found in review: a limit written as zero ("maxDepth": "0 mm", "circuits": 0,
     * "requiredCapacity": "0 kW") was read as "not set", and the search ran unlimited; an unknown
     * refrigerant in the conditions was accepted and every option listed as not rated, exit 0.
     */
    @Test
    void zeroLimitsAndAnUnknownFluidAreRefusedWhereTheFileIsRead() {
        String limits = "\"maxDepth\": \"100 mm\", \"circuits\": 2";
        assertThat(ROOMLESS).contains(limits);
        assertThatThrownBy(() -> ProjectFiles.parse(ROOMLESS.replace(limits, "\"maxDepth\": \"0 mm\", \"circuits\": 2"),
                "x")).isInstanceOf(InputException.class)
                .hasMessage("constraints.maxDepth: must be greater than zero, got 0 (leave the key out for no limit)");
        assertThatThrownBy(() -> ProjectFiles.parse(ROOMLESS.replace(limits, "\"maxDepth\": \"100 mm\", \"circuits\": 0"),
                "x")).isInstanceOf(InputException.class).hasMessageStartingWith("constraints.circuits: must be greater");
        assertThatThrownBy(() -> ProjectFiles.parse(ROOMLESS.replace(limits, limits + ", \"requiredCapacity\": \"0 kW\""),
                "x")).isInstanceOf(InputException.class).hasMessageStartingWith("constraints.requiredCapacity: must be");
        assertThat(ProjectFiles.parse(ROOMLESS.replace(limits, "\"circuits\": 2"), "x").constraints().maxDepth())
                .as("an absent limit is still 'not set'").isZero();
        String fluid = ROOMLESS.replaceFirst("\"fluid\": \"[^\"]*\"", "\"fluid\": \"R999\"");
        assertThat(fluid).contains("R999");
        assertThatThrownBy(() -> ProjectFiles.parse(fluid, "x")).isInstanceOf(InputException.class)
                .hasMessageStartingWith("conditions.refrigerant.fluid: unknown name \"R999\"");
    }

    @Test
    void badRoomValueIsOneLineNamingTheField() {
        String room = "\"circuits\": 2, \"room\": { \"volume\": \"%s\", \"floorArea\": \"60 m2\", "
                + "\"releaseHeight\": \"1.2 m\", \"selfContainedAppliance\": %s }";
        assertThatThrownBy(() -> ProjectFiles.parse(ROOMLESS.replace("\"maxDepth\": \"100 mm\", \"circuits\": 2",
                String.format(room, "-180 m3", "true")), "x")).isInstanceOf(InputException.class)
                .hasMessageStartingWith("constraints.room.volume: ").satisfies(e -> assertThat(e.getMessage()).doesNotContain("\n"));
        assertThatThrownBy(() -> ProjectFiles.parse(ROOMLESS.replace("\"maxDepth\": \"100 mm\", \"circuits\": 2",
                String.format(room, "180", "\"yes\"")), "x")).isInstanceOf(InputException.class)
                .hasMessageStartingWith("constraints.room.selfContainedAppliance: must be true or false");
        assertThatThrownBy(() -> ProjectFiles.parse(ROOMLESS.replace("\"maxDepth\": \"100 mm\", \"circuits\": 2",
                String.format(room, "180 kg", "true")), "x")).isInstanceOf(InputException.class)
                .hasMessageStartingWith("constraints.room.volume: ");
        assertThatThrownBy(() -> ProjectFiles.parse(ROOMLESS.replace("\"maxDepth\": \"100 mm\", \"circuits\": 2",
                String.format(room, "180 m3", "true").replace("\"floorArea\": \"60 m2\", ", "")), "x"))
                .isInstanceOf(InputException.class).hasMessage("constraints.room.floorArea: " + Msg.MISSING.format());
    }

    @Test
    void damagedOptionIsKeptWithItsErrorAndSavedVerbatim() throws IOException {
        String damagedEntry = "{ \"name\" : \"Damaged: fins thicker than their pitch\",\n      \"coil\": "
                + object(Files.readString(DEMO), "\"coil\"").replace("\"0.115 mm\"", "\"3 mm\"")
                + ",   \"extra spacing kept\":1.50 }";
        String text = withCandidate(Files.readString(DEMO), damagedEntry);
        Path f = dir.resolve("damaged.finstack.json");
        Files.writeString(f, text);
        Project p = ProjectFiles.read(f);
        assertThat(p.allOptions()).hasSize(2);
        assertThat(p.damaged()).singleElement().satisfies(d -> {
            assertThat(d.field()).isEqualTo("options[0]");
            assertThat(d.slot()).isZero();
            assertThat(d.name()).isEqualTo("Damaged: fins thicker than their pitch");
            // the first problem found in the entry, named by its field
            assertThat(d.error()).startsWith("options[0].");
            assertThat(d.json()).isEqualTo(damagedEntry);
        });
        assertThat(p.entries()).extracting(Project.Entry::readable).containsExactly(true, false, true);
        Path saved = dir.resolve("saved.finstack.json");
        ProjectFiles.write(saved, p.withName("edited"));
        String out = Files.readString(saved);
        assertThat(out).contains(damagedEntry);
        Project back = ProjectFiles.read(saved);
        assertThat(back).isEqualTo(p.withName("edited"));
        // a second save writes the same bytes: nothing drifts
        ProjectFiles.write(saved, back);
        assertThat(Files.readString(saved)).isEqualTo(out);
    }

    @Test
    void damagedExistingCoilLeavesTheCandidatesReadable() {
        String text = ROOMLESS.replace("\"name\": \"E-1 as found", "\"nmae\": \"E-1 as found");
        Project p = ProjectFiles.parse(text, "x");
        assertThat(p.existing()).isNull();
        assertThat(p.damaged()).singleElement().satisfies(d -> {
            assertThat(d.existing()).isTrue();
            assertThat(d.error()).startsWith("existing.nmae: ");
        });
        assertThat(ProjectFiles.toJson(p)).contains("\"existing\" : {\n    \"nmae\": \"E-1 as found");
    }

    @Test
    void fileWithNoReadableEntryIsRefusedWithTheFirstError() {
        String text = "{ \"version\": 1, \"name\": \"x\", \"conditions\": " + object(ROOMLESS, "\"conditions\"")
                + ", \"options\": [ { \"name\": \"a\", \"coil\": { \"tubeOuterDiameter\": \"9.52 mm\" } }, 7 ] }";
        assertThatThrownBy(() -> ProjectFiles.parse(text, "x")).isInstanceOf(InputException.class)
                .hasMessageStartingWith("options[0].coil.");
    }

    /** The project text with one more candidate, as raw text, first in the options list. */
    private static String withCandidate(String project, String entry) {
        int list = project.indexOf('[', project.indexOf("\"options\""));
        return project.substring(0, list + 1) + "\n    " + entry + "," + project.substring(list + 1);
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
