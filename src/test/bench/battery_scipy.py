"""The full battery of one Holdpoint characteristic, scripted with scipy, for every column of a wide CSV.

The reference for the whole-process benchmark (docs/performance.md, not part of the test suite): what a
practitioner would otherwise script per characteristic, at the same size and with the same outputs as
`holdpoint analyze FILE -q` computes them: descriptives, Welch and pooled t with intervals, TOST, the F-test with
its interval, Brown-Forsythe (Levene on medians), Wilcoxon-Mann-Whitney with the Hodges-Lehmann shift and its
order-statistic interval, Shapiro-Wilk and Anderson-Darling per group, Grubbs and the generalized ESD (up to 10),
lag-1 autocorrelation, capability Pp/Ppk with Bissell's bound (when limits are given, here mean +- 6 sd of the
pooled data) and the expected ppm. Usage: python3 battery_scipy.py FILE.csv
"""
import sys
import warnings

import numpy as np
from scipy import stats

ALPHA = 0.05
# scipy 1.17 announces a change of anderson()'s p-value; only the statistic is used here
warnings.filterwarnings("ignore", category=FutureWarning)


def esd(x, r_max=10):
    x = np.sort(x)
    n = len(x)
    lo, hi = 0, n
    found = 0
    for i in range(1, min(r_max, n - 2) + 1):
        v = x[lo:hi]
        m, s = v.mean(), v.std(ddof=1)
        if abs(v[0] - m) > abs(v[-1] - m):
            r, lo = abs(v[0] - m) / s, lo + 1
        else:
            r, hi = abs(v[-1] - m) / s, hi - 1
        p = 1 - ALPHA / (2 * (n - i + 1))
        t = stats.t.ppf(p, n - i - 1)
        lam = (n - i) * t / np.sqrt((n - i - 1 + t * t) * (n - i + 1))
        if r > lam:
            found = i
    return found


def grubbs(x):
    n = len(x)
    g = np.max(np.abs(x - x.mean())) / x.std(ddof=1)
    t = stats.t.ppf(1 - ALPHA / (2 * n), n - 2)
    return g, (n - 1) / np.sqrt(n) * np.sqrt(t * t / (n - 2 + t * t))


def hodges_lehmann(b, a):
    d = np.subtract.outer(a, b).ravel()
    n1, n2 = len(b), len(a)
    z = stats.norm.ppf(1 - ALPHA / 2)
    k = int(np.floor(n1 * n2 / 2 - z * np.sqrt(n1 * n2 * (n1 + n2 + 1) / 12)))
    part = np.partition(d, [k, len(d) - 1 - k, len(d) // 2])
    return np.median(d), part[k], part[len(d) - 1 - k]


def capability(x, lsl, usl):
    n, m, s = len(x), x.mean(), x.std(ddof=1)
    ppk = min(usl - m, m - lsl) / (3 * s)
    bound = ppk - stats.norm.ppf(1 - ALPHA) * np.sqrt(1 / (9 * n) + ppk * ppk / (2 * (n - 1)))
    ppm = 1e6 * (stats.norm.cdf((lsl - m) / s) + stats.norm.sf((usl - m) / s))
    return (usl - lsl) / (6 * s), ppk, bound, ppm


def battery(b, a):
    out = []
    for g in (b, a):
        out += [len(g), g.mean(), g.std(ddof=1), np.median(g), g.min(), g.max()]
        out += list(stats.shapiro(g)) + [stats.anderson(g).statistic]
        out += list(grubbs(g)) + [esd(g)]
        out += [np.corrcoef(g[:-1], g[1:])[0, 1]]
    welch = stats.ttest_ind(a, b, equal_var=False)
    pooled = stats.ttest_ind(a, b, equal_var=True)
    out += [welch.pvalue, pooled.pvalue] + list(welch.confidence_interval(1 - ALPHA))
    # TOST against +-0.02 with the Welch standard error and df
    va, vb = a.var(ddof=1) / len(a), b.var(ddof=1) / len(b)
    se = np.sqrt(va + vb)
    df = (va + vb) ** 2 / (va * va / (len(a) - 1) + vb * vb / (len(b) - 1))
    diff = a.mean() - b.mean()
    out += [stats.t.sf((diff + 0.02) / se, df), stats.t.cdf((diff - 0.02) / se, df)]
    f = a.var(ddof=1) / b.var(ddof=1)
    d1, d2 = len(a) - 1, len(b) - 1
    out += [f, 2 * min(stats.f.cdf(f, d1, d2), stats.f.sf(f, d1, d2)),
            f / stats.f.ppf(1 - ALPHA / 2, d1, d2), f / stats.f.ppf(ALPHA / 2, d1, d2)]
    out += [stats.levene(b, a, center="median").pvalue]
    out += [stats.mannwhitneyu(a, b).pvalue] + list(hodges_lehmann(b, a))
    both = np.concatenate([b, a])
    lsl, usl = both.mean() - 6 * both.std(), both.mean() + 6 * both.std()
    for g in (b, a):
        out += list(capability(g, lsl, usl))
    return out


def main(path):
    with open(path) as f:
        header = f.readline().rstrip("\n").split(",")
    data = np.genfromtxt(path, delimiter=",", skip_header=1, usecols=range(1, len(header)))
    group = np.genfromtxt(path, delimiter=",", skip_header=1, usecols=[0], dtype=str)
    before, after = group == "before", group == "after"
    results = [battery(data[before, c], data[after, c]) for c in range(data.shape[1])]
    print(f"{len(results)} characteristics, {len(results[0])} numbers each")


if __name__ == "__main__":
    main(sys.argv[1])
