package org.finstack.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Every string the workbench asks for exists in Messages.properties (including keys built from
 * enum names), and the light and dark themes define the same {@code Finstack.*} colour keys.
 */
class MessagesCatalogueTest {

    private static final Path UI = Path.of("src/main/java/org/finstack/ui");
    private static final Pattern LITERAL = Pattern.compile("Messages\\.(?:get|format)\\(\"([^\"]+)\"\\s*[,)]");

    @Test
    void everyLiteralKeyExists() throws IOException {
        List<String> missing = new ArrayList<>();
        try (Stream<Path> files = Files.walk(UI)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                Matcher m = LITERAL.matcher(Files.readString(f));
                while (m.find()) {
                    if (!Messages.has(m.group(1))) {
                        missing.add(f.getFileName() + ": " + m.group(1));
                    }
                }
            }
        }
        assertThat(missing).isEmpty();
    }

    @Test
    void keysBuiltFromNamesExist() {
        List<String> keys = new ArrayList<>();
        for (SweepPanel.Choice c : SweepPanel.Choice.values()) {
            keys.add("sweep.parameter." + c.name());
            keys.add("sweep.parameterInText." + c.name());
        }
        for (Theme t : Theme.values()) {
            keys.add("menu.view.theme." + t.name());
        }
        for (String k : new org.finstack.coil.Resistances(1, 1, 1, 1, 1, 1, 1, 1).shares().keySet()) {
            keys.add("results.resistance." + k);
        }
        for (org.finstack.study.CoilModel m : org.finstack.study.CoilModel.values()) {
            keys.add("conditions.model." + m.id());
        }
        for (org.finstack.geometry.Arrangement a : org.finstack.geometry.Arrangement.values()) {
            keys.add("coil.arrangement." + a.id());
        }
        for (org.finstack.coil.Duty d : org.finstack.coil.Duty.values()) {
            keys.add("conditions.duty." + d.id());
        }
        for (String k : List.of("open", "save", "saveAs", "import", "rate", "cancel", "undo", "redo", "duplicate",
                "remove", "rename", "units", "cautions", "about", "quit", "exportDrawing", "openDemo")) {
            keys.add("action." + k);
        }
        for (String k : ResultsPanel.KEYS) {
            keys.add("results." + k);
        }
        for (ConditionsForm.TargetKind t : ConditionsForm.TargetKind.values()) {
            keys.add("conditions.target." + t.name());
        }
        for (org.finstack.coil.RefrigerantSide.SaturationConvention c
                : org.finstack.coil.RefrigerantSide.SaturationConvention.values()) {
            keys.add("conditions.convention." + c.name());
        }
        for (String k : List.of("circuit", "row", "tube", "refrigerantIn", "refrigerantOut", "qualityIn", "qualityOut",
                "airIn", "airOut", "duty")) {
            keys.add("coilmap.column." + k);
        }
        for (String k : List.of("rows", "tubesPerRow", "tubeOuterDiameter", "tubeWall", "tubeMaterial", "finPitch",
                "finThickness", "finMaterial", "coating", "finnedLength", "depth", "circuits", "capacity", "airOut",
                "airPressureDrop", "airflow", "ua", "finEfficiency", "metalMass")) {
            keys.add("compare.row." + k);
        }
        for (org.finstack.study.explain.Sensitivity.Input in : org.finstack.study.explain.Sensitivity.Input.values()) {
            keys.add("study.sensitivity.input." + in.name());
        }
        SearchPanel.COLUMNS.forEach(k -> keys.add("study.search.column." + k));
        SensitivityPanel.COLUMNS.forEach(k -> keys.add("study.sensitivity.column." + k));
        assertThat(keys).allMatch(Messages::has, "present in Messages.properties");
    }

    @Test
    void lightAndDarkThemesDefineTheSameFinstackKeys() throws IOException {
        assertThat(finstackKeys("FinstackDarkLaf.properties")).isEqualTo(finstackKeys("FinstackLightLaf.properties"))
                .isNotEmpty();
    }

    private static Set<String> finstackKeys(String name) throws IOException {
        Properties p = new Properties();
        try (InputStream in = Theme.class.getResourceAsStream(name)) {
            p.load(in);
        }
        Set<String> keys = new TreeSet<>();
        p.stringPropertyNames().stream().filter(k -> k.startsWith("Finstack.")).forEach(keys::add);
        return keys;
    }
}
