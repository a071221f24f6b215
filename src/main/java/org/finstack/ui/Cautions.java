package org.finstack.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.finstack.coil.CoilCase;
import org.finstack.coil.Duty;

/** The cautions text: for one rated case, and in full for the menu's cautions panel. */
final class Cautions {

    private Cautions() {
    }

    /**
     * @param c a rated case
     * @return the cautions its refrigerant calls for, or empty text when none
     */
    static String forCase(CoilCase c) {
        if (c == null) {
            return "";
        }
        String fluid = c.refrigerant().fluid();
        Set<RefrigerantSafety.Hazard> hazards = RefrigerantSafety.hazards(fluid);
        if (hazards.isEmpty()) {
            return "";
        }
        RefrigerantSafety.Entry e = RefrigerantSafety.of(fluid);
        List<String> lines = new ArrayList<>();
        lines.add(Messages.format("cautions.intro", e.name(), e.group()));
        if (hazards.contains(RefrigerantSafety.Hazard.HIGH_PRESSURE)) {
            lines.add(Messages.get("cautions.pressure"));
        }
        if (hazards.contains(RefrigerantSafety.Hazard.FLAMMABLE)) {
            lines.add(Messages.get("cautions.flammable"));
        }
        if (hazards.contains(RefrigerantSafety.Hazard.TOXIC)) {
            lines.add(Messages.get("cautions.toxic"));
        }
        if (c.refrigerant().duty() == Duty.CONDENSER) {
            lines.add(Messages.get("cautions.height"));
        }
        lines.add(Messages.get("cautions.codes"));
        return String.join("\n", lines);
    }

    /** @return every caution, with the refrigerant table and its source */
    static String full() {
        StringBuilder b = new StringBuilder();
        b.append(Messages.get("cautions.fullIntro")).append("\n\n");
        for (String k : List.of("cautions.pressure", "cautions.flammable", "cautions.toxic", "cautions.height")) {
            b.append("\u2022 ").append(Messages.get(k)).append("\n");
        }
        b.append("\n").append(Messages.get("cautions.tableTitle")).append("\n");
        RefrigerantSafety.table().values().forEach(e -> b.append(String.format(java.util.Locale.ROOT,
                "  %-12s %-4s %s%n", e.name(), e.group(), e.hazards().isEmpty() ? "" : e.hazards().toString()
                        .toLowerCase(java.util.Locale.ROOT).replace('_', ' '))));
        b.append("\n").append(Messages.get("cautions.source")).append(" ").append(RefrigerantSafety.SOURCE.reference())
                .append("\n\n").append(Messages.get("cautions.codes"));
        return b.toString();
    }
}
