"""Whole-process benchmark of Holdpoint against the general-purpose references (docs/performance.md).

Runs each command of a pair alternately (Holdpoint first, then the reference), N pairs, as separate processes,
and prints the median wall time, the ratio of the medians and each process's peak resident set (from wait4).
Not part of the test suite: a benchmark measures, a test asserts. Usage (from the project folder, after
`java -cp target/holdpoint.jar:target/test-classes org.holdpoint.importer.bench.BenchFiles target/bench`):

    python3 src/test/bench/process_bench.py target/bench [pairs]
"""
import os
import statistics
import subprocess
import sys
import time

HERE = os.path.dirname(os.path.abspath(__file__))


def run(cmd):
    start = time.perf_counter()
    p = subprocess.Popen(cmd, stdout=subprocess.DEVNULL, stderr=subprocess.PIPE)
    _, status, usage = os.wait4(p.pid, 0)
    wall = time.perf_counter() - start
    err = p.stderr.read().decode(errors="replace")
    p.stderr.close()
    if os.waitstatus_to_exitcode(status) != 0:
        raise SystemExit(f"{' '.join(cmd)} failed: {err}")
    return wall, usage.ru_maxrss / 1024  # ru_maxrss is in KiB on Linux


def pair(name, ours, ref, pairs):
    a, b, ra, rb = [], [], [], []
    for _ in range(pairs):
        w, r = run(ours)
        a.append(w)
        ra.append(r)
        w, r = run(ref)
        b.append(w)
        rb.append(r)
    ma, mb = statistics.median(a), statistics.median(b)
    print(f"| {name} | {ma:.2f} s ({min(a):.2f}-{max(a):.2f}) | {mb:.2f} s ({min(b):.2f}-{max(b):.2f}) "
          f"| {ma / mb:.2f} | {statistics.median(ra):.0f} MB | {statistics.median(rb):.0f} MB |")


def main():
    d = sys.argv[1]
    pairs = int(sys.argv[2]) if len(sys.argv) > 2 else 3
    holdpoint = [os.path.join(HERE, "..", "..", "..", "holdpoint")]
    print("| workload | Holdpoint, median (range) | reference, median (range) | ratio | Holdpoint peak RSS "
          "| reference peak RSS |")
    print("|---|---|---|---|---|---|")
    pair("full battery, 200 characteristics x 500 + 500, wide CSV (reference: scipy)",
         holdpoint + ["analyze", os.path.join(d, "battery-200.csv"), "-q"],
         [sys.executable, os.path.join(HERE, "battery_scipy.py"), os.path.join(d, "battery-200.csv")], pairs)
    pair("1,000,000 values, stacked .xlsx, whole analyze (reference: readxl's bare read)",
         holdpoint + ["analyze", os.path.join(d, "million.xlsx"), "-q"],
         ["Rscript", os.path.join(HERE, "read_readxl.R"), os.path.join(d, "million.xlsx")], pairs)
    demo_dir = os.path.join(d, "demo-out")
    os.makedirs(demo_dir, exist_ok=True)
    times = []
    for _ in range(pairs):
        w, r = run(holdpoint + ["demo", "--out", demo_dir])
        times.append(w)
    print(f"| holdpoint demo (7 characteristics, charts and workbook) | {statistics.median(times):.2f} s "
          f"({min(times):.2f}-{max(times):.2f}) | | | {r:.0f} MB | |")


if __name__ == "__main__":
    main()
