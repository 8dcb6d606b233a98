#!/usr/bin/env python3
"""Makes the invented demo change study shipped with Holdpoint (deterministic, seeded).

Scenario (invented): machining cell 4 bores the Ø25 H7 seat of a pump housing, part PH-2210 rev C.
The plant changes the supplier of the boring-bar insert. Thirty housings were measured before the
change and thirty after, on the cell's coordinate measuring machine (4 decimals) and a roughness
tester (2 decimals). Run: python3 generate_boring_bar_insert.py  (writes the two CSV files here).
"""
import csv
import random

rng = random.Random(20261201)

# name, unit, decimals, before mean, before sd, after mean, after sd
CHARACTERISTICS = [
    ("Bore diameter", "mm", 4, 25.0102, 0.0018, 25.0105, 0.0017),
    ("Bore depth", "mm", 4, 40.0010, 0.0150, 40.0035, 0.0150),
    ("Bore roundness", "mm", 4, 0.0021, 0.0005, 0.0022, 0.0005),
    ("Bore perpendicularity", "mm", 4, 0.0080, 0.0015, 0.0082, 0.0015),
    ("Surface roughness Ra", "um", 2, 0.80, 0.06, 1.05, 0.07),
    ("Chamfer width", "mm", 4, 0.5000, 0.0200, 0.5120, 0.0200),
    ("Bore position", "mm", 4, 0.0180, 0.0040, 0.0190, 0.0080),
]
N = 30

with open("boring-bar-insert.csv", "w", newline="") as f:
    w = csv.writer(f, lineterminator="\n")
    w.writerow(["characteristic", "phase", "unit", "value"])
    for name, unit, dec, mb, sb, ma, sa in CHARACTERISTICS:
        for phase, mean, sd, first in (("before", mb, sb, 1001), ("after", ma, sa, 2001)):
            for i in range(N):
                v = max(rng.gauss(mean, sd), 10 ** -dec)
                w.writerow([name, phase, "PH-%d" % (first + i), "%.*f" % (dec, v)])
