package org.finstack.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.finstack.coil.CoilCase;
import org.finstack.io.CaseFiles;
import org.finstack.study.explain.Explanation;
import org.finstack.study.explain.Sensitivity;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code finstack sensitivity CASE.json}: the change in capacity and air pressure drop for a
 * stated step in each input, largest effect first (tornado data), with the trade-offs in words.
 */
@Command(name = "sensitivity", mixinStandardHelpOptions = true,
        description = "Shows how capacity and air pressure drop answer to a step in each input.")
final class SensitivityCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE", description = "case file (JSON)")
    private Path caseFile;

    @Option(names = "--json", description = "print one JSON object (SI values) instead of a table")
    private boolean json;

    @Override
    public Integer call() throws Exception {
        CoilCase c = CaseFiles.read(caseFile);
        Sensitivity.Result s = Sensitivity.of(c);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            ObjectNode root = Output.envelope("sensitivity", caseFile);
            ObjectNode res = root.putObject("results");
            res.put("capacity_W", s.baseRating().capacity());
            res.put("airPressureDrop_Pa", s.baseRating().airPressureDrop());
            ArrayNode arr = res.putArray("effects");
            for (Sensitivity.Effect e : s.effects()) {
                ObjectNode n = arr.addObject();
                n.put("input", e.input().label());
                n.put("step", e.step());
                if (e.rated()) {
                    n.put("capacityChange_W", e.capacityChange());
                    n.put("capacityChange", e.capacityFraction());
                    n.put("airPressureDropChange_Pa", e.airPressureDropChange());
                    n.put("airPressureDropChange", e.airPressureDropFraction());
                } else {
                    n.put("error", e.error());
                }
            }
            ArrayNode words = res.putArray("explanation");
            Explanation.forCoil(s).forEach(words::add);
            out.println(Output.pretty(root));
            return 0;
        }
        out.println("Sensitivity of " + caseFile.getFileName() + " (" + s.baseRating().model() + " model), largest "
                + "effect on capacity first");
        out.printf(Locale.ROOT, "  %-24s %-62s %10s %12s%n", "input", "step", "capacity", "air dp");
        for (Sensitivity.Effect e : s.effects()) {
            if (e.rated()) {
                out.printf(Locale.ROOT, "  %-24s %-62s %+9.2f %% %+10.2f %%  %s%n", e.input().label(), e.step(),
                        100 * e.capacityFraction(), 100 * e.airPressureDropFraction(),
                        bar(e.capacityFraction()));
            } else {
                out.printf(Locale.ROOT, "  %-24s %-62s not rated: %s%n", e.input().label(), e.step(), e.error());
            }
        }
        out.println();
        Explanation.forCoil(s).forEach(x -> out.println("  - " + x));
        return 0;
    }

    private static String bar(double fraction) {
        int n = (int) Math.min(30, Math.round(Math.abs(fraction) * 200));
        return (fraction < 0 ? "-" : "+").repeat(n);
    }
}
