#!/usr/bin/env python3
"""Golden values for riffle's Welch PSD and FFT Hilbert transform, from scipy.

Writes welch_input.csv (the deterministic input) and welch_golden.csv (scipy's results).
Run once from this directory:  python3 welch_scipy.py
The JUnit test WelchReferenceTest reads both files; it does not need Python.
"""
import numpy as np
import scipy
import scipy.signal

FS = 1000.0
N = 6000
rng = np.random.default_rng(20261201)
t = np.arange(N) / FS
x = (1.5 * np.sin(2 * np.pi * 50.3 * t)
     + 0.4 * np.sin(2 * np.pi * 123.7 * t + 0.3)
     + 0.3 * rng.standard_normal(N)
     + 0.2)

with open("welch_input.csv", "w") as f:
    f.write("# deterministic input for welch_scipy.py: fs=%g Hz, numpy default_rng(20261201)\n" % FS)
    for v in x:
        f.write(repr(float(v)) + "\n")

cases = [
    ("density_256", dict(nperseg=256)),
    ("spectrum_256", dict(nperseg=256, scaling="spectrum")),
    ("density_200_nfft256", dict(nperseg=200, nfft=256)),
    ("density_1024", dict(nperseg=1024)),
]
with open("welch_golden.csv", "w") as f:
    f.write("# scipy %s, numpy %s: scipy.signal.welch(x, fs=%g, window='hann', "
            "noverlap=nperseg//2, detrend='constant', return_onesided=True)\n"
            % (scipy.__version__, np.__version__, FS))
    f.write("# hilbert_4096: abs(scipy.signal.hilbert(x[:4096]))\n")
    f.write("case,index,frequency_hz,value\n")
    for name, kw in cases:
        freqs, pxx = scipy.signal.welch(x, fs=FS, window="hann", detrend="constant",
                                        return_onesided=True, **kw)
        for i, (fr, p) in enumerate(zip(freqs, pxx)):
            f.write("%s,%d,%r,%r\n" % (name, i, float(fr), float(p)))
    env = np.abs(scipy.signal.hilbert(x[:4096]))
    for i, v in enumerate(env):
        f.write("hilbert_4096,%d,0,%r\n" % (i, float(v)))
