#!/usr/bin/env python3
"""numpy reference for the maps bench (common/src/bench/maps.ts): the correlation map of a field on an
index at one lag, vectorised over cells — per-cell monthly climatology over the whole period with the
80 % rule, anomalies, paired sums, r, slope, lag-1 autocorrelations over the pairs, Bretherton nEff and
the t-test p (scipy.special.betainc when scipy is present), then Benjamini–Hochberg. Reads the bench's
Float32 field and Float64 index; prints {"bestMs": …} on its last line. Usage: maps_numpy.py DIR NLAT NLON MONTHS LAG
"""
import json
import sys
import time

import numpy as np

try:
    from scipy.special import betainc
except ImportError:  # numpy only: p from the normal approximation is not the same work; say so
    betainc = None

d, nlat, nlon, nt, lag = sys.argv[1], int(sys.argv[2]), int(sys.argv[3]), int(sys.argv[4]), int(sys.argv[5])
field = np.fromfile(f'{d}/field.f32', dtype=np.float32).reshape(nt, nlat * nlon)
index = np.fromfile(f'{d}/index.f64', dtype=np.float64)


def work():
    f = field.astype(np.float64)
    years = nt // 12
    by_month = f[: years * 12].reshape(years, 12, -1)
    count = np.isfinite(by_month).sum(axis=0)
    with np.errstate(invalid='ignore', divide='ignore'):
        clim = np.nansum(by_month, axis=0) / count
    clim[count < np.ceil(0.8 * years)] = np.nan
    anom = f - clim[np.arange(nt) % 12]
    ic = np.nanmean(index)
    ia = index - np.array([np.nanmean(index[m::12]) for m in range(12)])[np.arange(nt) % 12]
    x = np.full(nt, np.nan)
    x[lag:] = ia[: nt - lag]
    ok = np.isfinite(anom) & np.isfinite(x)[:, None]
    a = np.where(ok, x[:, None], 0.0)
    b = np.where(ok, anom, 0.0)
    n = ok.sum(axis=0)
    ma = a.sum(0) / n
    mb = b.sum(0) / n
    da = np.where(ok, a - ma, 0.0)
    db = np.where(ok, b - mb, 0.0)
    sxx = (da * da).sum(0)
    syy = (db * db).sum(0)
    sxy = (da * db).sum(0)
    r = sxy / np.sqrt(sxx * syy)
    slope = sxy / sxx
    adj = ok[1:] & ok[:-1]
    r1a = (np.where(adj, da[1:] * da[:-1], 0.0)).sum(0) / sxx
    r1b = (np.where(adj, db[1:] * db[:-1], 0.0)).sum(0) / syy
    q = r1a * r1b
    neff = np.clip(np.where(1 + q > 0, n * (1 - q) / (1 + q), n), 3, n)
    dof = neff - 2
    if betainc is not None:
        p = betainc(dof / 2, 0.5, (1 - r) * (1 + r))
    else:
        p = np.exp(-0.5 * r * r * dof)
    pv = p[np.isfinite(p)]
    order = np.sort(pv)
    m = order.size
    passed = np.nonzero(order <= np.arange(1, m + 1) * 0.1 / m)[0]
    return r, slope, p, (passed[-1] + 1 if passed.size else 0), ic


with np.errstate(invalid='ignore', divide='ignore'):
    work()
    times = []
    cpu = []
    for _ in range(5):
        t0, c0 = time.perf_counter(), time.process_time()
        work()
        times.append((time.perf_counter() - t0) * 1e3)
        cpu.append((time.process_time() - c0) * 1e3)
print(json.dumps({'bestMs': min(times), 'bestCpuMs': min(cpu), 'scipy': betainc is not None}))
