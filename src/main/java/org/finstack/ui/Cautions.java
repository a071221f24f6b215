package org.finstack.ui;

import java.util.List;
import org.finstack.core.FinstackException;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.Fluids;

/**
 * The cautions panel of the Help menu: for every refrigerant the fluid layer knows, its safety
 * class (from its data file) and the cautions {@link org.finstack.study.Cautions} gives for it,
 * the blends Finstack refuses with the reason, then the statement that local codes govern. One
 * source of truth: the same cautions the command line and each rating show.
 */
final class Cautions {

    private Cautions() {
    }

    /**
     * Builds the text; it loads every fluid's data, so call it off the event thread.
     *
     * @return every refrigerant's cautions
     */
    static String full() {
        StringBuilder b = new StringBuilder();
        b.append(Messages.get("cautions.fullIntro")).append("\n\n");
        List<String> names = new java.util.ArrayList<>(Fluids.names());
        names.addAll(Fluids.blendNames());
        for (String n : names) {
            try {
                Fluid f = Fluids.byName(n);
                List<String> lines = org.finstack.study.Cautions.forFluid(f);
                b.append(Messages.format("cautions.fluidLine", f.info().name(), f.info().safetyClass())).append("\n");
                // the last two lines (work at height, codes govern) stand once at the end
                for (String line : lines.subList(0, Math.max(0, lines.size() - 2))) {
                    b.append("    \u2022 ").append(line).append("\n");
                }
            } catch (FinstackException e) {
                b.append(n).append(": ").append(e.getMessage()).append("\n");
            }
        }
        b.append("\n").append(Messages.get("cautions.unsupportedTitle")).append("\n");
        Fluids.unsupported().forEach((n, reason) -> b.append("  ").append(reason).append("\n"));
        List<String> standing = org.finstack.study.Cautions.forFluid(Fluids.byName("R134a"));
        b.append("\n").append(standing.get(standing.size() - 2)).append("\n\n")
                .append(org.finstack.study.Cautions.GOVERNING);
        return b.toString();
    }
}
