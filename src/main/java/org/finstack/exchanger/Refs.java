package org.finstack.exchanger;

import org.finstack.core.Citation;

/** The published sources of this package, in one place so that each is spelled once. */
final class Refs {

    private Refs() {
    }

    /** Counterflow, parallel-flow and one-fluid-mixed crossflow relations. */
    static final Citation KAYS_LONDON = Citation.of("Kays & London 1984",
            "W. M. Kays, A. L. London, Compact Heat Exchangers, 3rd ed., McGraw-Hill, New York, 1984,"
                    + " Chapter 2 (effectiveness-NTU relations and tables)");

    /** The usual approximation for crossflow with both fluids unmixed, and the NTU relations. */
    static final Citation INCROPERA_DEWITT = Citation.of("Incropera & DeWitt 2002",
            "F. P. Incropera, D. P. DeWitt, Fundamentals of Heat and Mass Transfer, 5th ed., Wiley,"
                    + " New York, 2002, Table 11.3 (effectiveness relations) and Table 11.4 (NTU relations)");

    /** The exact series for crossflow with both fluids unmixed. */
    static final Citation MASON = Citation.of("Mason 1954",
            "J. L. Mason, Heat transfer in cross flow, Proceedings of the 2nd U.S. National Congress of"
                    + " Applied Mechanics (Ann Arbor, 1954), ASME, New York, 1955, pp. 801-803");

    /** Review of the effectiveness relations, including Mason's series. */
    static final Citation BACLIC = Citation.of("Baclic 1990",
            "B. S. Baclic, epsilon-Ntu analysis of complicated flow arrangements, in: R. K. Shah,"
                    + " A. D. Kraus, D. Metzger (eds.), Compact Heat Exchangers - A Festschrift for"
                    + " A. L. London, Hemisphere, New York, 1990, pp. 31-90");

    /** Counter-crossflow relations for one to four tube rows. */
    static final Citation ESDU_86018 = Citation.of("ESDU 86018",
            "ESDU 86018, Effectiveness-NTU relations for the design and performance evaluation of"
                    + " two-stream heat exchangers, Engineering Sciences Data Unit, London, 1986");

    /** Multipass crossflow with any number of passes; why many rows approach counterflow. */
    static final Citation PIGNOTTI_CORDERO = Citation.of("Pignotti & Cordero 1983",
            "A. Pignotti, G. O. Cordero, Mean temperature difference in multipass crossflow,"
                    + " ASME Journal of Heat Transfer 105 (3) (1983) 584-591");

    /** LMTD, the P-R-F relations and the consistency F = NTU(counterflow) / NTU(arrangement). */
    static final Citation SHAH_SEKULIC = Citation.of("Shah & Sekulic 2003",
            "R. K. Shah, D. P. Sekulic, Fundamentals of Heat Exchanger Design, Wiley, Hoboken, 2003,"
                    + " Chapter 3 (P-NTU and mean temperature difference methods)");
}
