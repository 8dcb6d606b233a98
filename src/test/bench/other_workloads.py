"""Whole-process benchmark of the workloads beside the reference comparisons (docs/performance.md): two builds of
Holdpoint run alternately, N rounds, and the median wall time of each workload is printed for both.

Not part of the test suite: a benchmark measures, a test asserts. Usage, from the project folder:

    python3 src/test/bench/other_workloads.py DIR ROUNDS "BEFORE COMMAND" "NOW COMMAND"

for example, an earlier jar run with the launcher's flags against the launcher itself:

    python3 src/test/bench/other_workloads.py target/bench 7 \\
        "java -XX:+UseSerialGC -XX:TieredStopAtLevel=1 -jar /tmp/earlier.jar" "./holdpoint"

The files are written into DIR with fixed seeds (invented data): rank-100k.csv (100,000 + 100,000 values, 4
decimals), fitted.csv with its settings file (four characteristics of 125 + 125 values from gamma and Weibull
distributions, an upper limit, a ratio margin and the family named), and the demo's workbook, whose raw-data
sheet is the small .xlsx read.
"""
import math
import os
import random
import shlex
import statistics
import subprocess
import sys
import time


def write_files(d):
    os.makedirs(d, exist_ok=True)
    rnd = random.Random(20261204)
    with open(os.path.join(d, "rank-100k.csv"), "w") as f:
        f.write("phase,Seat height (mm)\n")
        for phase, mean in (("before", 12.0), ("after", 12.001)):
            for _ in range(100_000):
                f.write(f"{phase},{rnd.gauss(mean, 0.004):.4f}\n")
    rows = ["phase,Flatness A (mm),Runout B (mm),Flatness C (mm),Runout D (mm)"]
    for phase in ("before", "after"):
        for _ in range(125):
            def weibull(scale, shape):
                return scale * (-math.log(1 - rnd.random())) ** (1 / shape)
            rows.append(f"{phase},{rnd.gammavariate(2.0, 0.004):.4f},{weibull(0.01, 1.8):.4f},"
                        f"{rnd.gammavariate(2.0, 0.005):.4f},{weibull(0.012, 2.2):.4f}")
    with open(os.path.join(d, "fitted.csv"), "w") as f:
        f.write("\n".join(rows) + "\n")
    with open(os.path.join(d, "fitted.settings.csv"), "w") as f:
        f.write("characteristic,usl,margin_ratio,distribution\nFlatness A,0.06,1.25,gamma\n"
                "Runout B,0.05,1.25,weibull\nFlatness C,0.07,1.25,gamma\nRunout D,0.06,1.25,weibull\n")


def run(cmd):
    start = time.perf_counter()
    p = subprocess.run(cmd, stdout=subprocess.DEVNULL, stderr=subprocess.PIPE)
    wall = time.perf_counter() - start
    if p.returncode != 0:
        raise SystemExit(f"{' '.join(cmd)} failed: {p.stderr.decode(errors='replace')}")
    return wall


def main():
    d, rounds, before, now = sys.argv[1], int(sys.argv[2]), shlex.split(sys.argv[3]), shlex.split(sys.argv[4])
    write_files(d)
    demo = os.path.join(d, "demo-for-xlsx")
    run(now + ["demo", "--out", demo])
    jobs = {
        "rank sum with exact Hodges-Lehmann bounds, 100,000 x 100,000 CSV":
            ["analyze", os.path.join(d, "rank-100k.csv"), "-q"],
        "four fitted characteristics (gamma, Weibull; n = 125; bootstrap bound)":
            ["analyze", os.path.join(d, "fitted.csv"), "-q"],
        "the demo workbook's raw-data sheet (.xlsx)":
            ["analyze", os.path.join(demo, "boring-bar-insert-signoff.xlsx"), "--sheet", "Raw data", "-q"],
        "plan --margin 0.01 --sd 0.004 --difference 0 --power 0.9":
            ["plan", "--margin", "0.01", "--sd", "0.004", "--difference", "0", "--power", "0.9"],
        "demo": ["demo", "--out", os.path.join(d, "demo-out")],
    }
    times = {name: ([], []) for name in jobs}
    for _ in range(rounds):
        for name, args in jobs.items():
            times[name][0].append(run(before + args))
            times[name][1].append(run(now + args))
    print("| workload | before, median | now, median |")
    print("|---|---|---|")
    for name, (a, b) in times.items():
        print(f"| {name} | {statistics.median(a):.2f} s | {statistics.median(b):.2f} s |")


if __name__ == "__main__":
    main()
