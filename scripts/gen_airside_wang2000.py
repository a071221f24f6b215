#!/usr/bin/env python3
"""Reference values for Wang, Chi & Chang (2000) plain fin-and-tube correlation.

Evaluates the published equations of
  Wang, C.-C., Chi, K.-Y., Chang, C.-J., 2000, "Heat transfer and friction
  characteristics of plain fin-and-tube heat exchangers, part II: Correlation",
  Int. J. Heat Mass Transfer 43:2693-2700 (Eqs. for j with N = 1, j with N >= 2, f)
written out independently of the Java implementation, in plain Python (math
module only), and writes
src/test/resources/reference/airside_wang2000_plain.csv.

Run from the repository root:  python3 scripts/gen_airside_wang2000.py
"""
import math
import os

def j_factor(re, dc, dh, pt, pl, fp, n):
    ln = math.log(re)
    if n == 1:
        p1 = 1.9 - 0.23 * ln
        p2 = -0.236 + 0.126 * ln
        return (0.108 * re ** -0.29 * (pt / pl) ** p1 * (fp / dc) ** -1.084
                * (fp / dh) ** -0.786 * (fp / pt) ** p2)
    p3 = -0.361 - 0.042 * n / ln + 0.158 * math.log(n * (fp / dc) ** 0.41)
    p4 = -1.224 - 0.076 * (pl / dh) ** 1.42 / ln
    p5 = -0.083 + 0.058 * n / ln
    p6 = -5.735 + 1.21 * math.log(re / n)
    return (0.086 * re ** p3 * n ** p4 * (fp / dc) ** p5 * (fp / dh) ** p6
            * (fp / pt) ** -0.93)

def f_factor(re, dc, pt, pl, fp, n):
    ln = math.log(re)
    f1 = -0.764 + 0.739 * pt / pl + 0.177 * fp / dc - 0.00758 / n
    f2 = -15.689 + 64.021 / ln
    f3 = 1.696 - 15.695 / ln
    return 0.0267 * re ** f1 * (pt / pl) ** f2 * (fp / dc) ** f3

# geometries [m]: Dc, Dh, Pt, Pl, Fp, N (inside the published ranges); Dh is the unit-cell
# value 4 Amin Pl / Ao of a continuous plate fin, rounded to 0.01 mm
GEOMETRIES = [
    (10.23e-3, 2.76e-3, 25.4e-3, 22.0e-3, 2.23e-3, 1),
    (10.23e-3, 2.76e-3, 25.4e-3, 22.0e-3, 2.23e-3, 2),
    (8.51e-3, 1.60e-3, 25.4e-3, 19.05e-3, 1.21e-3, 4),
    (7.53e-3, 2.07e-3, 21.0e-3, 12.7e-3, 1.55e-3, 6),
    (13.6e-3, 3.84e-3, 31.75e-3, 27.5e-3, 3.2e-3, 3),
]
REYNOLDS = [300.0, 1000.0, 3000.0, 8000.0, 20000.0]

def main():
    root = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
    out = os.path.join(root, "src", "test", "resources", "reference",
                       "airside_wang2000_plain.csv")
    lines = [
        "# source: Wang, Chi & Chang 2000, Int. J. Heat Mass Transfer 43:2693-2700, correlation equations for j (N = 1 and N >= 2) and f",
        "# table: values evaluated from the printed equations by an independent Python implementation (no published table of j and f values)",
        "# units: Dc, Dh, Pt, Pl, Fp in m; N, ReDc, j, f dimensionless",
        "# tolerance: 1e-9 relative (same equations, double precision)",
        "# generating script: scripts/gen_airside_wang2000.py",
        "Dc,Dh,Pt,Pl,Fp,N,ReDc,j,f",
    ]
    for dc, dh, pt, pl, fp, n in GEOMETRIES:
        for re in REYNOLDS:
            j = j_factor(re, dc, dh, pt, pl, fp, n)
            f = f_factor(re, dc, pt, pl, fp, n)
            lines.append(",".join(repr(v) for v in (dc, dh, pt, pl, fp, n, re, j, f)))
    with open(out, "w", encoding="utf-8") as fh:
        fh.write("\n".join(lines) + "\n")

if __name__ == "__main__":
    main()
