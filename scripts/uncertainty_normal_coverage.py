"""Reference coverage factors for NormalCoverageTest, from scipy.stats.norm.ppf.

Writes src/test/resources/reference/uncertainty_normal_coverage.csv: for a share of values within
+-band, k = Phi^-1((1 + share) / 2) and sigma = band / k.
Run: python3 scripts/uncertainty_normal_coverage.py
"""
import scipy
from scipy.stats import norm

ROWS = [(0.886, 0.15), (0.9545, 0.15), (0.6827, 0.10), (0.90, 0.20), (0.95, 0.15), (0.99, 0.10), (0.5, 0.10),
        (0.836, 0.15), (0.958, 0.15)]

with open("src/test/resources/reference/uncertainty_normal_coverage.csv", "w") as f:
    f.write("# source: scipy %s, scipy.stats.norm.ppf\n" % scipy.__version__)
    f.write("# table: coverage factor of the normal distribution for a share within a symmetric band (JCGM 100:2008 Table G.1)\n")
    f.write("# units: share -, band -, k -, sigma -\n")
    f.write("# tolerance: 1e-9 relative\n")
    f.write("# script: scripts/uncertainty_normal_coverage.py\n")
    f.write("share,band,k,sigma\n")
    for share, band in ROWS:
        k = norm.ppf((1 + share) / 2)
        f.write("%r,%r,%.15g,%.15g\n" % (share, band, k, band / k))
