#!/usr/bin/env python3
"""Writes af2-process-numpy.csv: the statistics of fixtures/demo/af2-process.csv computed with NumPy and
SciPy, the outside reference for ChannelsCommandTest's demo check. Run from the repository root after
the demo fixtures change: python3 src/test/resources/org/riffle/cli/channels_demo.py
Reference versions used: numpy 2.4.6, scipy 1.17.1 (python 3).
Conventions matched to riffle: tokens that are not numbers are missing and dropped; samples are
rounded to 32-bit floats first (riffle stores them so); std with ddof=1; skewness and kurtosis biased
(population moment ratios), kurtosis Pearson (fisher=False); crest = max|x| / rms."""
import csv
import re
import numpy as np
import scipy
from scipy import stats

SRC = "fixtures/demo/af2-process.csv"
OUT = "src/test/resources/org/riffle/cli/af2-process-numpy.csv"
with open(SRC, encoding="utf-8", newline="") as f:
    lines = [l for l in csv.reader(f) if l and not l[0].startswith("#")]
header, rows = lines[0], lines[1:]


def number(s):
    try:
        return float(s)
    except ValueError:
        return np.nan


with open(OUT, "w", newline="\n") as f:
    f.write(f"# numpy {np.__version__}, scipy {scipy.__version__}; from {SRC}\n")
    f.write("channel,samples,missing,mean,std,min,max,rms,crest,kurtosis,peak,skewness\n")
    for j in range(1, len(header) - 1):            # skip time and the status text column
        name = re.sub(r"\s*\[.*\]$", "", header[j])
        x = np.array([number(r[j]) for r in rows]).astype(np.float32).astype(np.float64)
        x = x[~np.isnan(x)]
        rms = np.sqrt(np.mean(x * x))
        peak = np.max(np.abs(x))
        vals = [np.mean(x), np.std(x, ddof=1), np.min(x), np.max(x), rms, peak / rms,
                stats.kurtosis(x, fisher=False, bias=True), peak, stats.skew(x, bias=True)]
        f.write(f"{name},{len(x)},{len(rows) - len(x)}," + ",".join(repr(float(v)) for v in vals) + "\n")
