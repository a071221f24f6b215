package org.finstack.study.pressure;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Numbers;
import org.finstack.core.Warnings;

/**
 * Screens a refrigerant charge against the room-based limits of EN 378-1 Annex C
 * ({@link En378Part1AnnexC}) and, for a self-contained commercial refrigerating appliance,
 * IEC 60335-2-89:2019 ({@link Iec60335Part2Part89}). It applies the lowest of:
 *
 * <ul>
 *   <li>practical limit, every class: {@code PL x V} (the practical limit is set by toxicity or,
 *       for many flammable refrigerants, by flammability);</li>
 *   <li>flammability, classes 2L, 2 and 3: {@code max(m1, min(room formula, m2))}, i.e. no room
 *       size below m1, the room formula between m1 and m2, and m2 as the largest charge the
 *       formula covers;</li>
 *   <li>for a self-contained appliance, classes A2L, A2, A3: the IEC 60335-2-89 limit.</li>
 * </ul>
 *
 * <p>Taking the lowest limit is conservative: EN 378-1 lets some rules stand in for others (the
 * room formula for comfort systems, no room-size check below m1), so a charge that fails this
 * screen may still be permitted, never the reverse for the rules applied. Only formulas that can
 * be cited are applied; the occupancy category, location class and additional measures
 * (detection, ventilation, machinery room) that EN 378 also weighs are left to the engineer, and
 * {@link #STATEMENT} says so with every result.
 *
 * <p>Worked example: R290 (LFL 0.038 kg/m3, practical limit 0.008 kg/m3), 0.30 kg, wall-mounted
 * unit (h0 = 1.8 m) in a room of 20 m2 floor and 50 m3: practical limit 0.008 x 50 = 0.4 kg, flammability
 * max(0.152, min(0.33764, 0.988)) = 0.33764 kg: the room formula governs and 0.30 kg is within it.
 */
public final class ChargeScreening {

    /** What governs beyond this screen. */
    public static final String STATEMENT = "Screening only. EN 378-1 (with the occupancy category and location "
            + "class of the installation), the appliance standards IEC 60335-2-40 and IEC 60335-2-89 where they "
            + "apply, ASHRAE 15 where it applies, and local codes govern the permitted charge; additional "
            + "measures such as leak detection, mechanical ventilation or a machinery room can change it.";

    private ChargeScreening() {
    }

    /**
     * Screens a charge.
     *
     * @param refrigerant            the refrigerant's safety data
     * @param roomVolume             volume of the smallest occupied room the refrigerant can leak into [m3]
     * @param floorArea              floor area of that room [m2]
     * @param releaseHeight          release height h0 of the unit [m] (see
     *                               {@link En378Part1AnnexC.ReleaseHeight})
     * @param charge                 refrigerant charge of the circuit [kg]
     * @param selfContainedAppliance whether the system is a self-contained commercial refrigerating
     *                               appliance under IEC 60335-2-89
     * @return the limits, the one applied, and whether the charge is within it
     * @throws InputException naming the offending field
     */
    public static ChargeScreeningResult screen(RefrigerantSafety refrigerant, double roomVolume, double floorArea,
            double releaseHeight, double charge, boolean selfContainedAppliance) {
        if (refrigerant == null) {
            throw new InputException("refrigerant", Msg.MISSING);
        }
        Check.positive("room.volume", roomVolume);
        Check.positive("room.floorArea", floorArea);
        Check.positive("room.releaseHeight", releaseHeight);
        Check.positive("charge", charge);
        List<ChargeLimit> limits = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        double pl = refrigerant.practicalLimit();
        limits.add(new ChargeLimit("EN 378-1 practical limit x room volume",
                En378Part1AnnexC.practicalLimitMaxCharge(pl, roomVolume),
                String.format(Locale.ROOT, "%s kg/m3 x %s m3", Numbers.brief(pl), Numbers.brief(roomVolume)),
                En378Part1AnnexC.SOURCE));
        SafetyClass cls = refrigerant.safetyClass();
        if (cls.flammable()) {
            double lfl = refrigerant.lfl().orElseThrow();
            limits.add(flammability(lfl, releaseHeight, floorArea, charge, notes));
            if (selfContainedAppliance) {
                OptionalDouble iec = Iec60335Part2Part89.maximumCharge(cls, lfl);
                if (iec.isPresent()) {
                    limits.add(new ChargeLimit("IEC 60335-2-89:2019 appliance limit", iec.getAsDouble(),
                            String.format(Locale.ROOT, "13 m3 x %s kg/m3%s", Numbers.brief(lfl),
                                    cls == SafetyClass.A3 ? "" : ", at most 1.2 kg"),
                            Iec60335Part2Part89.SOURCE));
                } else {
                    notes.add("IEC 60335-2-89 sets no charge limit for class " + cls + " here; it is not screened.");
                }
            }
            if (cls == SafetyClass.A2L || cls == SafetyClass.B2L) {
                notes.add("For class 2L refrigerants EN 378-1 and IEC 60335-2-40 allow larger charges with "
                        + "additional measures (ventilation, detection, shut-off); those are not screened here.");
            }
        }
        if (cls.higherToxicity()) {
            notes.add("Class " + cls + " is of higher toxicity: EN 378 restricts such systems in occupied spaces "
                    + "beyond the practical limit; check the occupancy and location tables.");
        }
        ChargeLimit governing = limits.stream().min(Comparator.comparingDouble(ChargeLimit::maxCharge)).orElseThrow();
        boolean within = charge <= governing.maxCharge();
        if (!within && cls.flammable() && charge <= En378Part1AnnexC.m1(refrigerant.lfl().orElseThrow())) {
            notes.add("The charge is at or below m1, where EN 378-1 sets no room size for flammability; the lower "
                    + "limit applied here is the conservative reading.");
        }
        notes.add("The lowest limit is applied (conservative): the standard may let one rule stand in for another.");
        return new ChargeScreeningResult(refrigerant.designation(), charge, limits, governing, within, notes,
                STATEMENT);
    }

    private static ChargeLimit flammability(double lfl, double h0, double area, double charge, List<String> notes) {
        double m1 = En378Part1AnnexC.m1(lfl);
        double m2 = En378Part1AnnexC.m2(lfl);
        double m3 = En378Part1AnnexC.m3(lfl);
        Warnings w = new Warnings();
        double room = En378Part1AnnexC.roomFormulaMaxCharge(lfl, h0, area, w);
        notes.addAll(w.list());
        notes.add(String.format(Locale.ROOT, "Flammability thresholds: m1 = %s kg, m2 = %s kg, m3 = %s kg "
                + "(4, 26 and 130 m3 x LFL).", Numbers.brief(m1), Numbers.brief(m2), Numbers.brief(m3)));
        if (charge > m2) {
            notes.add("The charge exceeds m2, the largest charge the room formula covers: EN 378 asks for further "
                    + "measures (or a machinery room or open air) that this screen does not assess.");
        }
        if (charge > m3) {
            notes.add("The charge also exceeds m3.");
        }
        String formula = String.format(Locale.ROOT, "2.5 x %s^1.25 x %s m x %s m2^0.5 = %s kg",
                Numbers.brief(lfl), Numbers.brief(h0), Numbers.brief(area), Numbers.brief(room));
        if (m1 >= Math.min(room, m2)) {
            return new ChargeLimit("EN 378-1 m1 (no room-size limit below it)", m1,
                    String.format(Locale.ROOT, "4 m3 x %s kg/m3; the room formula gives less (%s)",
                            Numbers.brief(lfl), formula), En378Part1AnnexC.SOURCE);
        }
        if (room <= m2) {
            return new ChargeLimit("EN 378-1 room formula", room, formula, En378Part1AnnexC.SOURCE);
        }
        return new ChargeLimit("EN 378-1 m2 (largest charge the room formula covers)", m2,
                String.format(Locale.ROOT, "26 m3 x %s kg/m3; the room formula gives more (%s)",
                        Numbers.brief(lfl), formula), En378Part1AnnexC.SOURCE);
    }
}
