#!/usr/bin/python3
"""Reference values for org.finstack.tubeside from the general-purpose `fluids` library.

Run with Debian's Python, where Debian's package python3-fluids is installed
(apt-get install -y python3-fluids):

    /usr/bin/python3 scripts/gen_tubeside_reference.py

Writes src/test/resources/reference/tubeside_fluids.csv. Each row is one evaluation of a fluids
function; columns that a kind does not use are 0. Kinds:
  1 Churchill_1977(Re, eD)                         -> Darcy f
  2 Colebrook(Re, eD) (exact Lambert-W solution)   -> Darcy f
  3 Friedel(m, x, rhol, rhog, mul, mug, sigma, D)  -> dP over L = 1 m [Pa/m]; fr = Froude number
  4 Muller_Steinhagen_Heck(m, x, ...)              -> dP over L = 1 m [Pa/m]
  5 Zivi(x, rhol, rhog)                            -> void fraction
  6 Rouhani_1(x, rhol, rhog, sigma, m, D)          -> void fraction (C0 = 1 + 0.2 (1-x))
  7 two_phase_dP_acceleration with Zivi void fractions, x -> xout -> dP [Pa]
  8 bend_rounded(D, angle, fd, bend_diameters, method='Rennels') -> K
"""
import math
import os

import fluids
from fluids.friction import Churchill_1977, Colebrook
from fluids.two_phase import Friedel, Muller_Steinhagen_Heck, two_phase_dP_acceleration
from fluids.two_phase_voidage import Zivi, Rouhani_1
from fluids.fittings import bend_rounded
from fluids.constants import g

OUT = os.path.join(os.path.dirname(__file__), '..', 'src', 'test', 'resources', 'reference', 'tubeside_fluids.csv')

# Saturated property sets (rho_l, rho_v, mu_l, mu_v, sigma), rounded values, from memory;
# only the arithmetic of the methods is compared, so exact property values do not matter.
PROPS = [
    (1277.8, 17.13, 2.503e-4, 1.104e-5, 0.01078),   # R134a near 5 C
    (1146.7, 50.09, 1.614e-4, 1.253e-5, 0.00608),   # R134a near 40 C
    (1170.0, 36.0, 1.60e-4, 1.25e-5, 0.0072),       # R410A near 5 C
    (915.0, 2.67, 180e-6, 14e-6, 0.0487),           # the fluids docstring example fluid
]
COLUMNS = ['kind', 'x', 'rhol', 'rhog', 'mul', 'mug', 'sigma', 'D', 'G', 're', 'eD', 'angle', 'rd', 'xout', 'fr',
           'value']


def row(kind, value, **kw):
    r = {c: 0.0 for c in COLUMNS}
    r.update(kw)
    r['kind'] = kind
    r['value'] = value
    return r


def main():
    rows = []
    for re in [200, 1000, 2000, 3000, 5000, 1e4, 1e5, 1e6, 1e7]:
        for ed in [0.0, 1e-5, 1e-3, 1e-2]:
            rows.append(row(1, Churchill_1977(re, ed), re=re, eD=ed))
            if re >= 4000:
                rows.append(row(2, Colebrook(re, ed), re=re, eD=ed))
    for (rl, rv, ml, mv, s) in PROPS:
        for d in [0.005, 0.008, 0.012]:
            for G in [50.0, 200.0, 600.0]:
                m = G * math.pi / 4 * d * d
                for x in [0.0, 0.05, 0.3, 0.6, 0.9, 1.0]:
                    rh = 1 / (x / rv + (1 - x) / rl)
                    fr = G * G / (g * d * rh * rh)
                    kw = dict(x=x, rhol=rl, rhog=rv, mul=ml, mug=mv, sigma=s, D=d, G=G)
                    rows.append(row(3, Friedel(m, x, rl, rv, ml, mv, s, d, 0.0, 1.0), fr=fr, **kw))
                    rows.append(row(4, Muller_Steinhagen_Heck(m, x, rl, rv, ml, mv, d, 0.0, 1.0), **kw))
                    if 0 < x < 1:
                        rows.append(row(5, Zivi(x, rl, rv), **kw))
                        rows.append(row(6, Rouhani_1(x, rl, rv, s, m, d), **kw))
                for (xi, xo) in [(0.1, 0.4), (0.2, 0.8), (0.7, 0.3), (0.05, 0.95)]:
                    ai, ao = Zivi(xi, rl, rv), Zivi(xo, rl, rv)
                    dp = two_phase_dP_acceleration(m, d, xi, xo, ai, ao, rl, rv)
                    rows.append(row(7, dp, x=xi, xout=xo, rhol=rl, rhog=rv, mul=ml, mug=mv, sigma=s, D=d, G=G))
    for angle in [90.0, 180.0]:
        for rd in [1.0, 1.5, 2.5, 5.0]:
            for fd in [0.015, 0.03, 0.06]:
                rows.append(row(8, bend_rounded(Di=0.01, angle=angle, fd=fd, bend_diameters=rd, method='Rennels'),
                                angle=angle, rd=rd, re=0.0, eD=fd))
    with open(OUT, 'w') as f:
        f.write('# source: python3-fluids version %s from Debian bookworm (Caleb Bell, fluids library),'
                ' evaluated with /usr/bin/python3 (Debian\'s Python)\n' % fluids.__version__)
        f.write('# table: fluids.friction.Churchill_1977 (kind 1), Colebrook (2), fluids.two_phase.Friedel (3),'
                ' Muller_Steinhagen_Heck (4), fluids.two_phase_voidage.Zivi (5), Rouhani_1 (6),'
                ' two_phase_dP_acceleration with Zivi void fractions (7),'
                ' fluids.fittings.bend_rounded method=Rennels with fd in column eD (8)\n')
        f.write('# units: SI; rho kg/m3, mu Pa s, sigma N/m, D m, G kg/(m2 s), angle degree; value: Darcy f [-],'
                ' gradient Pa/m (L = 1 m), void fraction [-], acceleration dP Pa, K [-]\n')
        f.write('# tolerance: 1e-9 relative for kinds 1 2 4 5 6 7 8 (same equations); kind 3 within'
                ' |Fr^0.0004 - 1| + 1e-9 (fluids uses the Froude exponent 0.0454, Finstack 0.045); fluids\'s'
                ' friction_factor uses 64/Re below Re 2040 and Colebrook above, which the test reproduces\n')
        f.write('# generating script: scripts/gen_tubeside_reference.py'
                ' (regenerate: /usr/bin/python3 scripts/gen_tubeside_reference.py)\n')
        f.write(','.join(COLUMNS) + '\n')
        for r in rows:
            f.write(','.join(repr(float(r[c])) for c in COLUMNS) + '\n')
    print(len(rows), 'rows written to', os.path.normpath(OUT))


if __name__ == '__main__':
    main()
