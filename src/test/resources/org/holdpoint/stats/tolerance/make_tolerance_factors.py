"""Reference tolerance factors computed with scipy (docs/sources.md, section J), independently of the Java code.

One-sided normal factor: k1 = nct.ppf(gamma, n - 1, z_p * sqrt(n)) / sqrt(n) (scipy's noncentral t, from Boost).
Two-sided normal factor (exact, Odeh & Owen 1980; ISO 16269-6 annex): the k solving
    gamma = sqrt(2n/pi) * integral_0^inf chi2.sf((n-1) r(z)^2 / k^2, n-1) * exp(-n z^2 / 2) dz,
r(z) the root of Phi(z + r) - Phi(z - r) = p, by scipy.integrate.quad (epsrel 1e-13) and brentq (xtol 1e-14).
A seeded simulation (numpy, 400,000 samples per case) of the confidence that x-bar +- k s covers p is written
beside the two-sided factors of n = 10 and 30: it must lie within 3 standard errors of gamma.
Run from this folder: python3 make_tolerance_factors.py
"""
import numpy as np
import scipy
from scipy import integrate, optimize, stats


def r_of(z, p):
    return optimize.brentq(lambda r: stats.norm.sf(z + r) + stats.norm.cdf(z - r) - (1 - p), 0, z + 40,
                           xtol=1e-15, rtol=1e-15)


def confidence(n, p, k):
    nu = n - 1
    f = lambda z: stats.chi2.sf(nu * r_of(z, p) ** 2 / k ** 2, nu) * np.exp(-n * z * z / 2)
    v, _ = integrate.quad(f, 0, 10 / np.sqrt(n), epsabs=0, epsrel=1e-13, limit=400)
    return np.sqrt(2 * n / np.pi) * v


def two_sided(n, p, g):
    return optimize.brentq(lambda k: confidence(n, p, k) - g, 0.5, 5000, xtol=1e-14, rtol=1e-15)


rows = ["n,coverage,confidence,k_one_sided,k_two_sided,simulated_confidence"]
rng = np.random.default_rng(20261204)
for p, g in [(0.90, 0.90), (0.95, 0.95), (0.95, 0.99), (0.99, 0.95), (0.99, 0.99), (0.999, 0.95)]:
    for n in (2, 3, 5, 10, 15, 20, 30, 50, 100, 500):
        k1 = stats.nct.ppf(g, n - 1, stats.norm.ppf(p) * np.sqrt(n)) / np.sqrt(n)
        k2 = two_sided(n, p, g)
        sim = ""
        if n in (10, 30) and (p, g) in [(0.95, 0.95), (0.99, 0.99)]:
            x = rng.standard_normal((400000, n))
            m, s = x.mean(1), x.std(1, ddof=1)
            sim = repr(float(((stats.norm.cdf(m + k2 * s) - stats.norm.cdf(m - k2 * s)) >= p).mean()))
        rows.append(f"{n},{p},{g},{float(k1)!r},{float(k2)!r},{sim}")
with open("tolerance-factors.csv", "w") as f:
    f.write(f"# scipy {scipy.__version__}, numpy {np.__version__}; make_tolerance_factors.py\n")
    f.write("\n".join(rows) + "\n")
