"""
Reference values for the engine's distribution tests, computed in 50-digit arithmetic with mpmath
(https://mpmath.org, version printed into the output). Run: python3 generate-reference.py > reference.json
Each value is printed with 25 significant digits.
"""
import json
import mpmath
from mpmath import mp, mpf

mp.dps = 50


def t_sf(t, df):
    t, df = mpf(t), mpf(df)
    if t < 0:
        return 1 - t_sf(-t, df)
    x = df / (df + t * t)
    return mpmath.betainc(df / 2, mpf(1) / 2, 0, x, regularized=True) / 2


def f_sf(x, d1, d2):
    x, d1, d2 = mpf(x), mpf(d1), mpf(d2)
    return mpmath.betainc(d2 / 2, d1 / 2, 0, d2 / (d2 + d1 * x), regularized=True)


def chi2_sf(x, df):
    return mpmath.gammainc(mpf(df) / 2, mpf(x) / 2, mpmath.inf, regularized=True)


def normal_sf(z):
    return mpmath.erfc(mpf(z) / mpmath.sqrt(2)) / 2


def invert_sf(sf, q, low, high):
    """Bisection on log x for sf(x) = q, sf decreasing on (low, high)."""
    q = mpf(q)
    lo, hi = mpmath.log(mpf(low)), mpmath.log(mpf(high))
    for _ in range(400):
        mid = (lo + hi) / 2
        if sf(mpmath.exp(mid)) > q:
            lo = mid
        else:
            hi = mid
    return mpmath.exp((lo + hi) / 2)


def s(v):
    return mpmath.nstr(v, 25, min_fixed=-1, max_fixed=-1)


out = {"source": "mpmath %s, 50-digit arithmetic (generate-reference.py)" % mpmath.__version__,
       "studentTSurvival": [], "fisherFSurvival": [], "chiSquareSurvival": [], "normalSurvival": [],
       "studentTInverseSurvival": [], "fisherFInverseSurvival": [], "chiSquareInverseSurvival": [],
       "normalInverseSurvival": []}

for df in [1, 3, 10, 30, 250, 1e4, 1e6]:
    for t in [0.1, 1, 1.96, 3, 7, 25, 1e3, 1e10]:
        v = t_sf(t, df)
        if v > mpf('1e-305'):
            out["studentTSurvival"].append({"t": t, "df": df, "value": s(v)})
for (d1, d2) in [(1, 1), (3, 20), (5, 100), (10, 10), (20, 1000), (2, 1e5)]:
    for x in [0.2, 1, 3.1, 10, 100, 1e4]:
        v = f_sf(x, d1, d2)
        if v > mpf('1e-305'):
            out["fisherFSurvival"].append({"x": x, "df1": d1, "df2": d2, "value": s(v)})
for df in [1, 4, 10, 50, 1000]:
    for x in [0.5, 3, 18.307, 100, 1000, 2000]:
        v = chi2_sf(x, df)
        if v > mpf('1e-305'):
            out["chiSquareSurvival"].append({"x": x, "df": df, "value": s(v)})
for z in [0.1, 1, 1.96, 5, 10, 20, 37]:
    out["normalSurvival"].append({"z": z, "value": s(normal_sf(z))})

for df in [1, 3, 10, 100, 1e5]:
    for q in [0.25, 0.025, 0.005, 1e-10, 1e-100, 1e-300]:
        v = invert_sf(lambda x: t_sf(x, df), q, mpf('1e-20'), mpf('1e305'))
        out["studentTInverseSurvival"].append({"q": q, "df": df, "value": s(v)})
for (d1, d2) in [(1, 10), (3, 20), (10, 10), (5, 500)]:
    for q in [0.5, 0.05, 0.01, 1e-12, 1e-200]:
        v = invert_sf(lambda x: f_sf(x, d1, d2), q, mpf('1e-30'), mpf('1e305'))
        out["fisherFInverseSurvival"].append({"q": q, "df1": d1, "df2": d2, "value": s(v)})
for df in [1, 5, 30, 400]:
    for q in [0.9, 0.5, 0.05, 1e-12, 1e-200]:
        v = invert_sf(lambda x: chi2_sf(x, df), q, mpf('1e-30'), mpf('1e5'))
        out["chiSquareInverseSurvival"].append({"q": q, "df": df, "value": s(v)})
for q in [0.4, 0.025, 1e-5, 1e-50, 1e-300]:
    v = invert_sf(normal_sf, q, mpf('1e-20'), mpf('100'))
    out["normalInverseSurvival"].append({"q": q, "value": s(v)})

print(json.dumps(out, indent=1))
