#!/usr/bin/env python3
"""Writes channels-small.csv (a small test log) and channels-small-scipy.csv (its statistics from
NumPy/SciPy, the outside reference for ChannelsCommandTest). Run once; both outputs are committed.
Reference versions used: numpy 2.4.6, scipy 1.17.1 (python 3).
Conventions matched to riffle: std with ddof=1; skewness and kurtosis biased (population moment
ratios), kurtosis Pearson (fisher=False); missing samples dropped; crest = max|x| / rms."""
import numpy as np
import scipy
from scipy import stats

rng = np.random.default_rng(7)
n = 40
t = np.arange(n)
cols = {
    "pressure": np.round(800 + 12 * np.sin(2 * np.pi * t / 9.5) + rng.normal(0, 2, n), 1),
    "current": np.round(60 + 0.5 * t + rng.normal(0, 0.4, n), 2),
    "vibration": np.round(np.abs(rng.normal(1.2, 0.05, n)), 3),
}
cols["vibration"][31] = 4.875          # one spike
cols["current"][17] = np.nan           # one missing sample
with open("channels-small.csv", "w", newline="\n") as f:
    f.write("time," + ",".join(cols) + "\n")
    for i in range(n):
        vals = ["NaN" if np.isnan(c[i]) else repr(float(c[i])) for c in cols.values()]
        f.write(f"2026-01-05 10:{i // 60:02d}:{i % 60:02d}," + ",".join(vals) + "\n")
with open("channels-small-scipy.csv", "w", newline="\n") as f:
    f.write(f"# numpy {np.__version__}, scipy {scipy.__version__}\n")
    f.write("channel,samples,missing,mean,std,min,max,rms,crest,kurtosis,peak,skewness\n")
    for name, c in cols.items():
        x = c.astype(np.float32).astype(np.float64)   # riffle holds samples as 32-bit floats
        x = x[~np.isnan(x)]
        rms = np.sqrt(np.mean(x * x))
        peak = np.max(np.abs(x))
        row = [len(x), n - len(x), np.mean(x), np.std(x, ddof=1), np.min(x), np.max(x), rms, peak / rms,
               stats.kurtosis(x, fisher=False, bias=True), peak, stats.skew(x, bias=True)]
        f.write(name + "," + ",".join(repr(float(v)) if isinstance(v, float) or hasattr(v, "dtype") and v.dtype.kind == "f" else str(v) for v in row) + "\n")
