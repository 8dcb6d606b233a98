#!/usr/bin/python3
# Second source for the distribution checks of FarTailsTest: every row of r-distributions.csv recomputed at 40
# significant digits with mpmath (documentation only; the Java suite reads mpmath-distributions.csv, never Python).
# Needed because R's qf (through qbeta) is not accurate to 1e-13 for a small numerator df (e.g. qf(1e-6, 1, 90) is
# 5e-4 relative off: pf(qf(1e-6, 1, 90), 1, 90) = 9.9974e-07).
#
# Run from this folder:   /usr/bin/python3 make-mpmath-values.py
# Produced with: Python 3.11.2, mpmath 1.2.1 (Debian python3-mpmath), mp.dps = 40.
# Definitions: pt(x, n) = I_{n/(n+x^2)}(n/2, 1/2)/2 for x < 0; pf_upper(x, a, b) = I_{b/(a x + b)}(b/2, a/2);
# pf_lower(x, a, b) = I_{a x/(a x + b)}(a/2, b/2); qnorm(p) = -sqrt(2) erfinv(1 - 2p) at 400 digits; the quantiles qt, qf, qchisq by
# mpmath.findroot (Anderson/secant in the log of the argument) on those cdfs, chi2 cdf = gammainc(n/2, 0, x/2)
# regularized. Each root is checked: its cdf equals p to 1e-30 relative.
import csv
import sys

import mpmath as mp

mp.mp.dps = 40


def tcdf(x, n):
    if x < 0:
        return mp.betainc(n / 2, mp.mpf(1) / 2, 0, n / (n + x * x), regularized=True) / 2
    return 1 - tcdf(-x, n)


def fcdf(x, a, b):
    return mp.betainc(a / 2, b / 2, 0, a * x / (a * x + b), regularized=True)


def fupper(x, a, b):
    return mp.betainc(b / 2, a / 2, 0, b / (a * x + b), regularized=True)


def chi2cdf(x, n):
    return mp.gammainc(n / 2, 0, x / 2, regularized=True)


def chi2upper(x, n):
    return mp.gammainc(n / 2, x / 2, mp.inf, regularized=True)


def positive_root(cdf, upper, p, guess):
    # solve on u = log x; use the tail that is small for accuracy
    if p <= 0.5:
        g = lambda u: mp.log(cdf(mp.exp(u))) - mp.log(p)
    else:
        g = lambda u: mp.log(upper(mp.exp(u))) - mp.log(1 - p)
    u = mp.findroot(g, mp.log(guess), solver="secant", tol=mp.mpf(10) ** -36, maxsteps=400)
    x = mp.exp(u)
    got = cdf(x) if p <= 0.5 else upper(x)
    want = p if p <= 0.5 else 1 - p
    assert abs(got / want - 1) < mp.mpf(10) ** -30, (p, x, got)
    return x


def value(fn, x, a, b):
    if fn == "pt":
        return tcdf(x, a)
    if fn == "pf_upper":
        return fupper(x, a, b)
    if fn == "pf_lower":
        return fcdf(x, a, b)
    if fn == "qnorm":
        if x == mp.mpf(1) / 2:
            return mp.mpf(0)
        with mp.workdps(400):  # 1 - 2p must keep p = 1e-300
            z = -mp.sqrt(2) * mp.erfinv(1 - 2 * x)
            assert abs(mp.ncdf(z) / x - 1) < mp.mpf(10) ** -30
        return +z
    if fn == "qt":
        if x == mp.mpf(1) / 2:
            return mp.mpf(0)
        s = -1 if x < 0.5 else 1
        q = x if x < 0.5 else 1 - x
        # |t| with P(T <= -|t|) = q
        r = positive_root(lambda t: tcdf(-t, a), lambda t: 1 - tcdf(-t, a), q, mp.mpf(2))
        return s * r
    if fn == "qf":
        return positive_root(lambda f: fcdf(f, a, b), lambda f: fupper(f, a, b), x, mp.mpf(1))
    if fn == "qchisq":
        return positive_root(lambda c: chi2cdf(c, a), lambda c: chi2upper(c, a), x, a)
    raise ValueError(fn)


rows = []
with open("r-distributions.csv", newline="") as f:
    for r in csv.DictReader(line for line in f if not line.startswith("#")):
        # the arguments exactly as the doubles R used
        x = mp.mpf(float(r["x"]))
        a = None if r["df1"] == "NA" else mp.mpf(float(r["df1"]))
        b = None if r["df2"] == "NA" else mp.mpf(float(r["df2"]))
        v = value(r["fn"], x, a, b)
        rows.append([r["fn"], r["x"], r["df1"], r["df2"], mp.nstr(v, 25, min_fixed=1, max_fixed=0), r["value"]])

with open("mpmath-distributions.csv", "w", newline="") as f:
    f.write("# Reference values written by make-mpmath-values.py (in this folder); not run at test time.\n")
    f.write("# Python %s; mpmath %s; mp.dps = 40; arguments are the binary64 values of r-distributions.csv.\n"
            % (sys.version.split()[0], mp.__version__))
    f.write("# value: mpmath, 25 significant digits; r_value: R 4.2.2 (copied from r-distributions.csv).\n")
    w = csv.writer(f, lineterminator="\n")
    w.writerow(["fn", "x", "df1", "df2", "value", "r_value"])
    w.writerows(rows)
print("written", len(rows))
