# Times scipy's maximum-likelihood fit of the same families on the same samples as FitBenchmark
# (median of 7 runs of 200 fits each after a warm-up). Run from this folder: python3 bench_scipy.py
import csv, statistics, time
import numpy as np
import scipy
from scipy import stats

rows = [r for r in csv.reader(l for l in open("fit-samples.csv") if not l.startswith("#"))][1:]
samples = {}
for sid, _, x in rows:
    samples.setdefault(sid, []).append(float(x))
fits = {
    "normal": lambda x: stats.norm.fit(x),
    "lognormal": lambda x: stats.lognorm.fit(x, floc=0),
    "weibull": lambda x: stats.weibull_min.fit(x, floc=0),
    "gamma": lambda x: stats.gamma.fit(x, floc=0),
    "rayleigh": lambda x: stats.rayleigh.fit(x, floc=0),
}
print("scipy", scipy.__version__, "numpy", np.__version__)
for sid in ("lnorm-30", "lnorm-125"):
    x = np.array(samples[sid])
    for name, f in fits.items():
        reps = 200
        f(x)
        ts = []
        for _ in range(7):
            t0 = time.perf_counter()
            for _ in range(reps):
                f(x)
            ts.append((time.perf_counter() - t0) / reps)
        print(f"fit {sid:9s} {name:10s} median {statistics.median(ts) * 1e6:9.1f} us")
