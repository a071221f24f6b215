#!/usr/bin/env python3
"""Independent evaluation of the printed equations of the in-tube heat-transfer methods and the
two-phase bend method of org.finstack.tubeside (no published tables of these values could be
read). Plain Python, no third-party package.

    python3 scripts/gen_tubeside_equations.py

Writes src/test/resources/reference/tubeside_equations.csv. Kinds:
  1 Gnielinski 1976 / 2013 transition: G column = Re, x column = Pr, q column = wall (0 temperature, 1 flux) -> Nu
  2 Gungor & Winterton 1987 (evaporating fixture)                      -> h [W/(m2 K)]
  3 Shah 1982 (evaporating fixture)                                     -> h
  4 Kandlikar 1990, F_fl = 1.63 (R134a) (evaporating fixture)           -> h
  5 Shah 1979 (condensing fixture)                                      -> h
  6 Shah 2009 horizontal (condensing fixture)                           -> h
  7 Cavallini et al. 2006 (condensing fixture), dT column               -> h
  8 Chisholm 1983 bend with Rennels K_lo and Churchill f, 180 deg, r/d = 1.5 (evaporating fixture) -> dp [Pa]
"""
import math
import os

OUT = os.path.join(os.path.dirname(__file__), '..', 'src', 'test', 'resources', 'reference', 'tubeside_equations.csv')
GRAV = 9.80665

# Fixture properties (rounded R134a saturation values, from memory); repeated in TubesideFixtures.java.
EVAP = dict(p=349.9e3, pc=4059.3e3, rl=1277.8, rv=17.13, ml=2.503e-4, mv=1.104e-5, kl=0.0898, kv=0.01167,
            cl=1355.0, cv=903.0, s=0.01078, hlv=194.9e3)
COND = dict(p=1016.6e3, pc=4059.3e3, rl=1146.7, rv=50.09, ml=1.614e-4, mv=1.253e-5, kl=0.0748, kv=0.0152,
            cl=1498.0, cv=1145.0, s=0.00608, hlv=163.0e3)


def prl(P):
    return P['cl'] * P['ml'] / P['kl']


def db(re, pr, k, d):
    return 0.023 * re ** 0.8 * pr ** 0.4 * k / d


def gnielinski(re, pr, wall):
    lam = 4.36 if wall == 1 else 3.66

    def turb(r):
        f = (1.82 * math.log10(r) - 1.64) ** -2
        return f / 8 * (r - 1000) * pr / (1 + 12.7 * math.sqrt(f / 8) * (pr ** (2 / 3) - 1))
    if re <= 2300:
        return lam
    if re >= 1e4:
        return turb(re)
    gam = (re - 2300) / (1e4 - 2300)
    return (1 - gam) * lam + gam * turb(1e4)


def gungor_winterton(P, G, x, q, d):
    bo = q / (G * P['hlv'])
    hl = db(G * (1 - x) * d / P['ml'], prl(P), P['kl'], d)
    e = 1 + 3000 * bo ** 0.86 + 1.12 * (x / (1 - x)) ** 0.75 * (P['rl'] / P['rv']) ** 0.41
    fr = G ** 2 / (P['rl'] ** 2 * GRAV * d)
    if fr < 0.05:
        e *= fr ** (0.1 - 2 * fr)
    return e * hl


def shah1982(P, G, x, q, d):
    bo = q / (G * P['hlv'])
    hl = db(G * (1 - x) * d / P['ml'], prl(P), P['kl'], d)
    fr = G ** 2 / (P['rl'] ** 2 * GRAV * d)
    co = ((1 - x) / x) ** 0.8 * (P['rv'] / P['rl']) ** 0.5
    n = co if fr >= 0.04 else 0.38 * fr ** -0.3 * co
    F = 14.7 if bo >= 11e-4 else 15.43
    cb = 1.8 / n ** 0.8
    if n > 1:
        nb = 230 * bo ** 0.5 if bo > 0.3e-4 else 1 + 46 * bo ** 0.5
        psi = max(nb, cb)
    elif n > 0.1:
        psi = max(F * bo ** 0.5 * math.exp(2.74 * n ** -0.1), cb)
    else:
        psi = max(F * bo ** 0.5 * math.exp(2.47 * n ** -0.15), cb)
    return psi * hl


def kandlikar(P, G, x, q, d, ffl=1.63):
    bo = q / (G * P['hlv'])
    hl = db(G * (1 - x) * d / P['ml'], prl(P), P['kl'], d)
    fr = G ** 2 / (P['rl'] ** 2 * GRAV * d)
    co = ((1 - x) / x) ** 0.8 * (P['rv'] / P['rl']) ** 0.5
    c5 = 0.3 if fr < 0.04 else 0.0
    cbd = 1.1360 * co ** -0.9 * (25 * fr) ** c5 + 667.2 * bo ** 0.7 * ffl
    nbd = 0.6683 * co ** -0.2 * (25 * fr) ** c5 + 1058.0 * bo ** 0.7 * ffl
    return max(cbd, nbd) * hl


def shah1979(P, G, x, d):
    pr = P['p'] / P['pc']
    hlo = db(G * d / P['ml'], prl(P), P['kl'], d)
    return hlo * ((1 - x) ** 0.8 + 3.8 * x ** 0.76 * (1 - x) ** 0.04 / pr ** 0.38)


def shah2009(P, G, x, d):
    pr = P['p'] / P['pc']
    rels = G * (1 - x) * d / P['ml']
    hlo = db(G * d / P['ml'], prl(P), P['kl'], d)
    n = 0.0058 + 0.557 * pr
    hi = hlo * (P['ml'] / (14 * P['mv'])) ** n * ((1 - x) ** 0.8 + 3.8 * x ** 0.76 * (1 - x) ** 0.04 / pr ** 0.38)
    jg = x * G / math.sqrt(GRAV * d * P['rv'] * (P['rl'] - P['rv']))
    z = (1 / x - 1) ** 0.8 * pr ** 0.4
    if jg >= 0.98 * (z + 0.263) ** -0.62:
        return hi
    hnu = 1.32 * rels ** (-1 / 3) * (P['rl'] * (P['rl'] - P['rv']) * GRAV * P['kl'] ** 3 / P['ml'] ** 2) ** (1 / 3)
    return hi + hnu


def cavallini(P, G, x, d, dT, ct=2.6):
    rl, rv, ml, mv, kl = P['rl'], P['rv'], P['ml'], P['mv'], P['kl']
    scale = math.sqrt(GRAV * d * rv * (rl - rv))
    jg = x * G / scale
    xtt = (ml / mv) ** 0.1 * (rv / rl) ** 0.5 * ((1 - x) / x) ** 0.9
    jgt = ((7.5 / (4.3 * xtt ** 1.111 + 1)) ** -3 + ct ** -3) ** (-1 / 3)
    hlo = db(G * d / ml, prl(P), kl, d)

    def ha(xx):
        return hlo * (1 + 1.128 * xx ** 0.8170 * (rl / rv) ** 0.3685 * (ml / mv) ** 0.2363
                      * (1 - mv / ml) ** 2.144 * prl(P) ** -0.100)
    if jg > jgt:
        return ha(x)
    xt = min(1.0, jgt * scale / G)
    strat = (0.725 / (1 + 0.741 * ((1 - x) / x) ** 0.3321)
             * (kl ** 3 * rl * (rl - rv) * GRAV * P['hlv'] / (ml * d * dT)) ** 0.25 + (1 - x ** 0.087) * hlo)
    return (ha(xt) * (jgt / jg) ** 0.8 - strat) * (jg / jgt) + strat


def churchill(re):
    a = (2.457 * math.log(1 / ((7 / re) ** 0.9))) ** 16
    b = (37530 / re) ** 16
    return 8 * ((8 / re) ** 12 + (a + b) ** -1.5) ** (1 / 12)


def chisholm_bend(P, G, x, d, rd=1.5, angle=180.0):
    f = churchill(G * d / P['ml'])
    a = math.radians(angle)
    s = math.sin(a / 2)
    k = f * a * rd + (0.10 + 2.4 * f) * s + 6.6 * f * (math.sqrt(s) + s) / rd ** (4 * a / math.pi)
    b = 1 + 2.2 / (k * (2 + rd))
    phi2 = 1 + (P['rl'] / P['rv'] - 1) * (b * x * (1 - x) + x * x)
    return phi2 * k * G * G / (2 * P['rl'])


def main():
    rows = []
    for re in [500, 2300, 3000, 5000, 9999, 1e4, 5e4, 1e6]:
        for pr in [0.8, 3.0, 50.0]:
            for wall in [0, 1]:
                rows.append((1, re, pr, wall, 0, 0, gnielinski(re, pr, wall)))
    for d in [0.005, 0.008, 0.012]:
        for G in [50.0, 200.0, 500.0]:
            for x in [0.05, 0.3, 0.5, 0.8]:
                for q in [2e3, 10e3, 40e3]:
                    rows.append((2, G, x, q, d, 0, gungor_winterton(EVAP, G, x, q, d)))
                    rows.append((3, G, x, q, d, 0, shah1982(EVAP, G, x, q, d)))
                    rows.append((4, G, x, q, d, 0, kandlikar(EVAP, G, x, q, d)))
                rows.append((8, G, x, 0, d, 0, chisholm_bend(EVAP, G, x, d)))
            for x in [0.05, 0.2, 0.5, 0.8, 0.95]:
                rows.append((5, G, x, 0, d, 0, shah1979(COND, G, x, d)))
                rows.append((6, G, x, 0, d, 0, shah2009(COND, G, x, d)))
                for dT in [2.0, 10.0]:
                    rows.append((7, G, x, 0, d, dT, cavallini(COND, G, x, d, dT)))
    with open(OUT, 'w') as f:
        f.write('# source: the printed equations of Gnielinski 1976/2013, Gungor & Winterton 1987, Shah 1982,'
                ' Kandlikar 1990, Shah 1979, Shah 2009, Cavallini et al. 2006, Chisholm 1983 with Rennels &'
                ' Hudson 2012 and Churchill 1977, as restated in the Javadoc of org.finstack.tubeside\n')
        f.write('# table: independent plain-Python evaluation (no published table of values was readable);'
                ' checks the Java arithmetic and branch logic, not the correlations themselves\n')
        f.write('# units: G kg/(m2 s) (kind 1: Re), x [-] (kind 1: Pr), q W/m2 (kind 1: wall 0 = uniform'
                ' temperature, 1 = uniform flux), D m, dT K; value h W/(m2 K), Nu [-] (kind 1), dp Pa (kind 8);'
                ' fixture properties R134a near 5 C (kinds 2-4, 8) and 40 C (kinds 5-7) as in'
                ' TubesideFixtures.java\n')
        f.write('# tolerance: 1e-9 relative (same equations, double precision)\n')
        f.write('# generating script: scripts/gen_tubeside_equations.py (regenerate: python3'
                ' scripts/gen_tubeside_equations.py)\n')
        f.write('kind,G,x,q,D,dT,value\n')
        for r in rows:
            f.write(','.join(repr(float(v)) for v in r) + '\n')
    print(len(rows), 'rows')
    # worked examples for the Javadoc
    print('GW', gungor_winterton(EVAP, 200, 0.5, 1e4, 0.008))
    print('Shah82', shah1982(EVAP, 200, 0.5, 1e4, 0.008))
    print('Kandlikar', kandlikar(EVAP, 200, 0.5, 1e4, 0.008))
    print('Shah79', shah1979(COND, 200, 0.5, 0.008))
    print('Shah09', shah2009(COND, 200, 0.5, 0.008), shah2009(COND, 50, 0.2, 0.008))
    print('Cav', cavallini(COND, 200, 0.5, 0.008, 5), cavallini(COND, 50, 0.2, 0.008, 5))
    print('Gn', gnielinski(5e4, 0.8, 0), gnielinski(5000, 3, 1))
    print('bend', chisholm_bend(EVAP, 200, 0.5, 0.008))


if __name__ == '__main__':
    main()
