#!/usr/bin/python3
# Second, independent source for the TOST values: statsmodels' ttost_ind / ttost_paired on the same cases and margins as
# r-tost.csv (documentation only; the Java suite reads statsmodels-tost.csv and never runs Python).
#
# Run from this folder, after make-reference-values.R:   /usr/bin/python3 make-statsmodels-values.py
# Produced with: Python 3.11.2, statsmodels 0.13.5 (Debian python3-statsmodels 0.13.5+dfsg-7), scipy 1.10.1, numpy 1.24.2.
# Calls: statsmodels.stats.weightstats.ttost_ind(after, before, low, upp, usevar='unequal' | 'pooled') and
#        ttost_paired(after, before, low, upp), on the residuals (value - offset) of r-inputs.csv, as the R values.
#        Both return (pvalue, (t1, p1, df1), (t2, p2, df2)): 1 = the test against the lower margin, 2 = against the upper.
# Only the alpha = 0.05 rows with margins of both sides are used (statsmodels has no one-sided margin form). Numbers printed with '%.17g'.
# Also checks that R parsed every input value to the correctly rounded double (Python's float() is correctly rounded).
import csv
import sys

import numpy as np
import scipy
import statsmodels
from statsmodels.stats.weightstats import ttost_ind, ttost_paired


def rows(name):
    with open(name, newline="") as f:
        return list(csv.DictReader(line for line in f if not line.startswith("#")))


inputs = {}
for r in rows("r-inputs.csv"):
    if float(r["value"]) != float(r["r_double"]):
        sys.exit("R misread %s of case %s" % (r["value"], r["case"]))
    inputs.setdefault(r["case"], {"before": [], "after": []})[r["group"]].append(float(r["residual"]))

out = []
for r in rows("r-tost.csv"):
    if r["margin_lower"] == "NA" or r["margin_upper"] == "NA" or r["alpha"] != "0.05":
        continue
    a = np.array(inputs[r["case"]]["after"])
    b = np.array(inputs[r["case"]]["before"])
    low, upp = float(r["margin_lower"]), float(r["margin_upper"])
    if r["method"] == "paired":
        p, (t1, p1, d1), (t2, p2, d2) = ttost_paired(a, b, low, upp)
    else:
        p, (t1, p1, d1), (t2, p2, d2) = ttost_ind(a, b, low, upp,
                                                   usevar="pooled" if r["method"] == "pooled" else "unequal")
    out.append([r["case"], r["method"], r["margin_lower"], r["margin_upper"]]
               + ["%.17g" % v for v in (p, t1, p1, d1, t2, p2, d2)])

with open("statsmodels-tost.csv", "w", newline="") as f:
    f.write("# Reference values written by make-statsmodels-values.py (in this folder); not run at test time.\n")
    f.write("# Python %s; statsmodels %s; scipy %s; numpy %s\n" % (sys.version.split()[0], statsmodels.__version__,
                                                                   scipy.__version__, np.__version__))
    f.write("# ttost_ind(after, before, margin_lower, margin_upper, usevar) / ttost_paired(after, before, ...) on the\n")
    f.write("# residuals; pvalue = max(p1, p2); 1 = lower-margin test (t1 = t_lower), 2 = upper-margin test.\n")
    w = csv.writer(f, lineterminator="\n")
    w.writerow(["case", "method", "margin_lower", "margin_upper", "pvalue", "t1", "p1", "df1", "t2", "p2", "df2"])
    w.writerows(out)
print("written", len(out))
