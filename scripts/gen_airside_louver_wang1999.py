#!/usr/bin/env python3
"""Reference values for the Wang, Lee, Chang & Lin (1999) louvered fin-and-tube correlation.

Evaluates the correlation equations of
  Wang, C.-C., Lee, C.-J., Chang, C.-T., Lin, S.-P., 1999, "Heat transfer and
  friction correlation for compact louvered fin-and-tube heat exchangers",
  Int. J. Heat Mass Transfer 42:1945-1956
(j for ReDc < 1000 and ReDc >= 1000, f for N >= 2), as transcribed by Jacobi,
Park, Tafti & Zhang (2001, ARTI phase I report), written out independently of the
Java implementation in plain Python (math module only), and writes
src/test/resources/reference/airside_louver_wang1999.csv.

This checks the Java transcription of the printed equations only: both sides
evaluate the same formulas, so it cannot detect a coefficient that was wrong in
the transcription itself.

The unit-cell quantities are computed here from their definitions: per tube and
fin pitch, Amin = (Pt - Dc)(Fp - t), Ao = 2 (Pt Pl - pi Dc^2/4) + pi Dc (Fp - t),
Dh = 4 Amin Pl / Ao, At = pi (Dc - 2 t) Fp (bare tube outside area).

Run from the repository root:  python3 scripts/gen_airside_louver_wang1999.py
"""
import math
import os


def unit_cell(dc, t, pt, pl, fp):
    """Hydraulic diameter [m] and Ao/At [-] of the continuous plate-fin unit cell."""
    a_min = (pt - dc) * (fp - t)
    a_o = 2.0 * (pt * pl - math.pi * dc * dc / 4.0) + math.pi * dc * (fp - t)
    a_t = math.pi * (dc - 2.0 * t) * fp
    return 4.0 * a_min * pl / a_o, a_o / a_t


def colburn(re, dc, dh, pt, pl, fp, n, lp, lh):
    lnre = math.log(re)
    r = lh / lp
    if re < 1000.0:
        e1 = -0.991 - 0.1055 * (pl / pt) ** 3.1 * math.log(r)
        e2 = -0.7344 + 2.1059 * n ** 0.55 / (lnre - 3.2)
        e3 = 0.08485 * (pl / pt) ** -4.4 * n ** -0.68
        e4 = -0.1741 * math.log(n)
        return (14.3117 * re ** e1 * (fp / dc) ** e2 * r ** e3 * (fp / pl) ** e4
                * (pl / pt) ** -1.724)
    e5 = -0.6027 + 0.02593 * (pl / dh) ** 0.52 * n ** -0.5 * math.log(r)
    e6 = -0.4776 + 0.40774 * n ** 0.7 / (lnre - 4.4)
    e7 = -0.58655 * (fp / dh) ** 2.3 * (pl / pt) ** -1.6 * n ** -0.65
    e8 = 0.0814 * (lnre - 3.0)
    return 1.1373 * re ** e5 * (fp / pl) ** e6 * r ** e7 * (pl / pt) ** e8 * n ** 0.3545


def fanning(re, dc, dh, pt, pl, fp, n, lp, lh, ao_at):
    lnre = math.log(re)
    r = lh / lp
    e5 = 0.1395 - 0.0101 * (fp / pl) ** 0.58 * r ** -2 * math.log(ao_at) * (pl / pt) ** 1.9
    e6 = -6.4367 / lnre
    e7 = 0.07191 * lnre
    e8 = -2.0585 * (fp / pt) ** 1.67 * lnre
    e9 = 0.1036 * math.log(pl / pt)
    return (0.06393 * re ** e5 * (fp / dc) ** e6 * (dh / dc) ** e7 * r ** e8 * n ** e9
            * (lnre - 4.0) ** -1.093)


# geometries [m]: Dc, t, Pt, Pl, Fp, N, Lp, Lh (inside the database range of the paper)
GEOMETRIES = [
    (10.23e-3, 0.115e-3, 25.4e-3, 19.05e-3, 1.8e-3, 2, 2.4e-3, 1.0e-3),
    (10.23e-3, 0.115e-3, 25.4e-3, 22.0e-3, 2.1e-3, 3, 2.4e-3, 1.0e-3),
    (7.53e-3, 0.115e-3, 21.0e-3, 12.7e-3, 1.55e-3, 4, 1.7e-3, 0.9e-3),
    (8.51e-3, 0.12e-3, 22.0e-3, 19.05e-3, 1.25e-3, 6, 3.0e-3, 1.3e-3),
]
REYNOLDS = [300.0, 600.0, 999.0, 1000.0, 2500.0, 7000.0]


def main():
    root = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
    out = os.path.join(root, "src", "test", "resources", "reference",
                       "airside_louver_wang1999.csv")
    lines = [
        "# source: Wang, Lee, Chang & Lin 1999, Int. J. Heat Mass Transfer 42:1945-1956, j (ReDc < 1000 and >= 1000) and f (N >= 2), as transcribed by Jacobi et al. 2001",
        "# table: values evaluated from the transcribed equations by an independent Python implementation (checks the Java transcription only; no published table of j and f values)",
        "# units: Dc, t, Pt, Pl, Fp, Lp, Lh, Dh in m; N, AoAt, ReDc, j, f dimensionless",
        "# tolerance: 1e-9 relative (same equations, double precision)",
        "# generating script: scripts/gen_airside_louver_wang1999.py",
        "Dc,t,Pt,Pl,Fp,N,Lp,Lh,Dh,AoAt,ReDc,j,f",
    ]
    for dc, t, pt, pl, fp, n, lp, lh in GEOMETRIES:
        dh, ao_at = unit_cell(dc, t, pt, pl, fp)
        for re in REYNOLDS:
            j = colburn(re, dc, dh, pt, pl, fp, n, lp, lh)
            f = fanning(re, dc, dh, pt, pl, fp, n, lp, lh, ao_at)
            lines.append(",".join(repr(v) for v in (dc, t, pt, pl, fp, n, lp, lh, dh, ao_at, re, j, f)))
    with open(out, "w", encoding="utf-8") as fh:
        fh.write("\n".join(lines) + "\n")


if __name__ == "__main__":
    main()
