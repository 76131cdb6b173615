#!/usr/bin/python3
"""Reference values for the maps engine (common/src/maps) and POST /api/fields/:fieldId/maps.

Rerun from the repository root after changing it, then commit both outputs:

    /usr/bin/python3 common/test-fixtures/scripts/maps_reference.py

Writes common/test-fixtures/maps-reference.json (the field, the index, the events and the expected
maps) and server/test/fixtures/netcdf/maps-field.nc (the same field as a NetCDF file). Debian's
numpy, xarray, scipy (scipy.stats.ttest_ind(equal_var=False), ttest_1samp, t) and statsmodels
(multipletests(method="fdr_bh")) compute the references in float64 from the float32-rounded data.
The tests never run Python.

The field is synthetic and seeded: 6 descending latitude rows (25°N … 25°S, 10° cells) × 12
longitude columns (30° cells, centres −165 … 165), 2000-01 … 2009-12, with a seasonal cycle, a
response to an invented index (lagged 2 months, stronger near the equator) and AR(1) noise.
Two cells are land (always missing); 2003-05 and 2007-11 are missing everywhere; one cell misses
most Februaries, so its February climatology fails the WMO-No. 1203 80 % rule.
"""
import json
import math
import os

import netCDF4
import numpy as np
import xarray as xr
from scipy import stats
from statsmodels.stats.multitest import multipletests

ROOT = os.path.abspath(os.path.join(os.path.dirname(__file__), '..', '..', '..'))
rng = np.random.default_rng(20261204)

LAT = np.array([25.0, 15.0, 5.0, -5.0, -15.0, -25.0])
LON = np.arange(-165.0, 180.0, 30.0)  # −180…180 convention
NT = 120
FIELD_START = 2000 * 12  # months since 0000-01
MONTHS = FIELD_START + np.arange(NT)

# Invented index: AR(1) from 1999-07 to 2010-06 (it starts before and ends after the field).
INDEX_START = 1999 * 12 + 6
index = np.zeros(132)
for t in range(1, 132):
    index[t] = 0.85 * index[t - 1] + rng.normal(0, 0.5)
index += 26 + 1.0 * np.cos(2 * np.pi * (np.arange(132) + 6) / 12)  # a seasonal cycle to remove
index[[40, 41]] = np.nan  # two missing index months

field = np.empty((NT, LAT.size, LON.size))
noise = np.zeros((LAT.size, LON.size))
for t in range(NT):
    noise = 0.6 * noise + rng.normal(0, 0.3, noise.shape)
    m = MONTHS[t]
    i = m - 2 - INDEX_START  # the index leads by 2 months
    drive = np.nan_to_num(index[i] - 26.0)
    season = 2.0 * np.cos(2 * np.pi * (m % 12) / 12)[None] * np.sign(LAT)[:, None]
    response = np.cos(np.radians(LAT * 3))[:, None] * np.cos(np.radians(LON / 2))[None, :] * drive
    field[t] = 20 + season + response + noise
field = field.astype(np.float32).astype(np.float64)
LAND = [(0, 3), (5, 10)]
for j, i in LAND:
    field[:, j, i] = np.nan
for t in [(2003 - 2000) * 12 + 4, (2007 - 2000) * 12 + 10]:
    field[t] = np.nan
for year in range(10):
    if year not in (0, 5, 9):
        field[year * 12 + 1, 2, 7] = np.nan  # cell (5°N, 45°E) misses 7 of 10 Februaries



def month(text):
    y, m = text.split('-')
    return int(y) * 12 + int(m) - 1


def name(m):
    return f'{m // 12:04d}-{m % 12 + 1:02d}'


def dataset(lon_convention):
    """The field as an xarray Dataset with a real time axis, in the −180…180 or 0…360 convention."""
    time = xr.cftime_range('2000-01-01', periods=NT, freq='MS', calendar='standard')
    da = xr.DataArray(field, dims=('time', 'lat', 'lon'), coords={'time': time, 'lat': LAT, 'lon': LON})
    if lon_convention == 360:
        da = da.assign_coords(lon=(da.lon % 360)).sortby('lon')
    return da


def region(da, lat=None, lon=None):
    """Rows with centres in [south, north] (storage order kept) and columns eastward from west."""
    if lat is not None:
        da = da.isel(lat=np.flatnonzero((da.lat >= min(lat)).values & (da.lat <= max(lat)).values))
    if lon is not None:
        west, east = lon
        span = east - west if east - west > 0 else east - west + 360
        d = (da.lon.values - west) % 360
        keep = np.flatnonzero(d <= span)
        keep = keep[np.argsort(d[keep], kind='stable')]
        da = da.isel(lon=keep).assign_coords(lon=west + d[keep])
    return da


def select(da, period, months):
    t = da.time.dt.year * 12 + da.time.dt.month - 1
    keep = (t >= month(period[0])) & (t <= month(period[1]))
    if months is not None:
        keep &= da.time.dt.month.isin(months)
    return da.isel(time=np.flatnonzero(keep.values))


def climatology(da, base, min_years=None):
    """Per-cell monthly means over the base period with the WMO-No. 1203 80 % rule, via xarray groupby."""
    b = select(da, base, None)
    n = month(base[1]) - month(base[0]) + 1
    years = np.array([n // 12 + (1 if (k - month(base[0]) % 12) % 12 < n % 12 else 0) for k in range(12)])
    mean = b.groupby('time.month').mean('time', skipna=True)
    count = b.notnull().groupby('time.month').sum('time')
    need = np.maximum(1, np.ceil(0.8 * years) if min_years is None else min_years)
    ok = count >= xr.DataArray(need[mean.month.values - 1], dims='month', coords={'month': mean.month})
    return mean.where(ok).reindex(month=np.arange(1, 13))


def anomalies(da, base):
    clim = climatology(da, base)
    return da.groupby('time.month') - clim


def index_anomaly(base):
    series = xr.DataArray(index, dims='time', coords={'time': xr.cftime_range('1999-07-01', periods=132, freq='MS', calendar='standard')})
    return anomalies(series, base).drop_vars('month').values


def to_list(a):
    return [None if not np.isfinite(v) else float(v) for v in np.asarray(a, dtype=float).ravel()]


def r1_paired(a, months):
    """Lag-1 autocorrelation over paired values, products only for consecutive months (NIST form)."""
    d = a - a.mean()
    num = sum(d[k] * d[k + 1] for k in range(len(a) - 1) if months[k + 1] == months[k] + 1)
    return num / np.sum(d * d)


def correlation_map(anom, times, base, lag):
    """r, slope, n, nEff (Bretherton et al. 1999, clamped to [3, n]) and p per cell, by loops."""
    ia = index_anomaly(base)
    nlat, nlon = anom.shape[1:]
    out = {k: np.full(nlat * nlon, np.nan) for k in ('r', 'slope', 'n', 'nEff', 'p')}
    for c in range(nlat * nlon):
        y = anom[:, c // nlon, c % nlon]
        x = np.array([ia[m - lag - INDEX_START] if 0 <= m - lag - INDEX_START < ia.size else np.nan for m in times])
        ok = np.isfinite(x) & np.isfinite(y)
        n = int(ok.sum())
        out['n'][c] = n
        if n < 3:
            continue
        xs, ys, ms = x[ok], y[ok], times[ok]
        out['slope'][c] = np.polyfit(xs, ys, 1)[0]
        r = np.corrcoef(xs, ys)[0, 1]
        out['r'][c] = r
        a = r1_paired(xs, ms) * r1_paired(ys, ms)
        neff = min(n, max(3, n * (1 - a) / (1 + a))) if 1 + a > 0 else n
        out['nEff'][c] = neff
        tval = r * math.sqrt((neff - 2) / (1 - r * r))
        out['p'][c] = 2 * stats.t.sf(abs(tval), neff - 2)
    return out


def fdr(p, alpha):
    ok = np.isfinite(p)
    reject, adj, _, _ = multipletests(p[ok], alpha=2 * alpha, method='fdr_bh')
    sig = np.zeros(p.size, dtype=bool)
    sig[ok] = reject
    adjusted = np.full(p.size, np.nan)
    adjusted[ok] = adj
    return {'significant': sig.tolist(), 'adjusted': to_list(adjusted), 'pointwise': int(np.sum(p[ok] <= alpha)), 'fdr': int(reject.sum()), 'tested': int(ok.sum())}


def composite(anom, times, offsets, baseline, months=None):
    event = {month(e['peak']) + k for e in EVENTS if e['phase'] == 'warm' for k in offsets}
    spans = [(month(e['start']), month(e['end'])) for e in EVENTS]
    sel = np.ones(times.size, bool) if months is None else np.isin(times % 12 + 1, months)
    is_event = np.array([m in event for m in times]) & sel
    is_neutral = np.array([not any(a <= m <= b for a, b in spans) for m in times]) & ~is_event & sel
    nlat, nlon = anom.shape[1:]
    values = np.full(nlat * nlon, np.nan)
    p = np.full(nlat * nlon, np.nan)
    for c in range(nlat * nlon):
        y = anom[:, c // nlon, c % nlon]
        ev = y[is_event][np.isfinite(y[is_event])]
        nu = y[is_neutral][np.isfinite(y[is_neutral])]
        if ev.size == 0 or (baseline == 'neutral' and nu.size == 0):
            continue
        if baseline == 'neutral':
            values[c] = ev.mean() - nu.mean()
            if ev.size >= 2 and nu.size >= 2:
                p[c] = stats.ttest_ind(ev, nu, equal_var=False).pvalue
        else:
            values[c] = ev.mean()
            if ev.size >= 2:
                p[c] = stats.ttest_1samp(ev, 0.0).pvalue
    return values, p, int(is_event.sum()), int(is_neutral.sum()) if baseline == 'neutral' else 0


def areas(lat, lon_count):
    edges = np.radians(np.concatenate([[lat[0] + 5], lat - 5])) if lat[0] > lat[-1] else None
    band = np.abs(np.diff(np.sin(edges)))
    return np.repeat(band, lon_count)


def pattern(a, b, w):
    ok = np.isfinite(a) & np.isfinite(b) & (w > 0)
    a, b, w = a[ok], b[ok], w[ok]
    ma, mb = np.average(a, weights=w), np.average(b, weights=w)
    cov = np.average((a - ma) * (b - mb), weights=w)
    r = cov / math.sqrt(np.average((a - ma) ** 2, weights=w) * np.average((b - mb) ** 2, weights=w))
    rms = math.sqrt(np.average((a - b) ** 2, weights=w))
    crms = math.sqrt(np.average(((a - ma) - (b - mb)) ** 2, weights=w))
    return {'correlation': r, 'rmsDifference': rms, 'centredRmsDifference': crms, 'cells': int(ok.sum())}


BASE = ('2000-01', '2009-12')


def find_events():
    """Runs of ≥ 4 months with the index anomaly ≥ +0.4 (warm) or ≤ −0.4 (cold); peak at the largest |anomaly|."""
    ia = index_anomaly(BASE)
    events = []
    for phase, sign in (('warm', 1), ('cold', -1)):
        run = []
        for k in range(ia.size + 1):
            if k < ia.size and np.isfinite(ia[k]) and sign * ia[k] >= 0.4:
                run.append(k)
                continue
            if len(run) >= 4:
                peak = run[int(np.argmax(sign * ia[run]))]
                events.append({'phase': phase, 'start': name(INDEX_START + run[0]), 'peak': name(INDEX_START + peak), 'end': name(INDEX_START + run[-1])})
            run = []
    return sorted(events, key=lambda e: e['start'])


EVENTS = find_events()
BOX = {'lat': [-20, 20], 'lon': [120, -120]}
cases = []


def add(name_, request, da, values, **extra):
    cases.append({'name': name_, 'request': request, 'lat': da.lat.values.tolist(), 'lon': da.lon.values.tolist(), 'values': to_list(values), **extra})


for conv in (180, 360):
    da = dataset(conv)
    whole = da
    add(f'mean, whole field, lon {conv}', {'mode': 'mean'}, whole, whole.mean('time', skipna=True).values, lonConvention=conv)
    box = region(da, BOX['lat'], BOX['lon'])
    djf = select(box, ('2000-12', '2009-02'), [12, 1, 2])
    add(f'mean DJF 2000-12..2009-02, box across the antimeridian, lon {conv}', {'mode': 'mean', 'period': {'from': '2000-12', 'to': '2009-02'}, 'months': 'DJF', 'region': BOX}, box, djf.mean('time', skipna=True).values, lonConvention=conv)

da = dataset(180)
anom = anomalies(da, BASE)
times = MONTHS
add('anomaly at 2005-03', {'mode': 'anomaly-at', 'period': {'from': '2005-03', 'to': '2005-03'}, 'base': {'from': BASE[0], 'to': BASE[1]}}, da, anom.isel(time=62).values, lonConvention=180)
add('anomaly at February 2004 (a cell fails the 80 % rule)', {'mode': 'anomaly-at', 'period': {'from': '2004-02', 'to': '2004-02'}, 'base': {'from': BASE[0], 'to': BASE[1]}}, da, anom.isel(time=49).values, lonConvention=180)
jja = select(anom, ('2001-01', '2008-12'), [6, 7, 8])
add('mean anomaly JJA 2001..2008, base 2000..2009', {'mode': 'anomaly-at', 'period': {'from': '2001-01', 'to': '2008-12'}, 'months': 'JJA', 'base': {'from': BASE[0], 'to': BASE[1]}}, da, jja.mean('time', skipna=True).values, lonConvention=180)

an = anom.values
for baseline in ('neutral', 'none'):
    v, p, ne, nn = composite(an, times, [1, 2, 3], baseline)
    sig = fdr(p, 0.05)
    add(f'warm composite, peak + 1..3, minus {baseline}', {'mode': 'composite', 'base': {'from': BASE[0], 'to': BASE[1]}, 'offsets': [1, 2, 3], 'baseline': baseline, 'phase': 'warm', 'alpha': 0.05}, da, v, p=to_list(p), fdr=sig, eventMonths=ne, neutralMonths=nn, lonConvention=180)

for lag in (0, 2, -3):
    cm = correlation_map(an, times, BASE, lag)
    sig = fdr(cm['p'], 0.05)
    add(f'correlation, lag {lag}', {'mode': 'correlation', 'base': {'from': BASE[0], 'to': BASE[1]}, 'lag': lag, 'alpha': 0.05}, da, cm['r'], p=to_list(cm['p']), nEff=to_list(cm['nEff']), n=to_list(cm['n']), fdr=sig, lonConvention=180)
    add(f'regression, lag {lag}', {'mode': 'regression', 'base': {'from': BASE[0], 'to': BASE[1]}, 'lag': lag, 'alpha': 0.05}, da, cm['slope'], p=to_list(cm['p']), lonConvention=180)

# Correlation over DJF months only (the lag-1 neighbourhood breaks between February and December).
sub = anomalies(da, BASE)
keep = np.isin(times % 12 + 1, [12, 1, 2])
cm = correlation_map(sub.values[keep], times[keep], BASE, 2)
add('correlation DJF only, lag 2', {'mode': 'correlation', 'base': {'from': BASE[0], 'to': BASE[1]}, 'lag': 2, 'months': 'DJF', 'alpha': 0.05}, da, cm['r'], p=to_list(cm['p']), nEff=to_list(cm['nEff']), lonConvention=180)

# FDR on p-values spread over (0, 1) with ties and a missing value, straight from statsmodels.
p_demo = np.array([0.001, 0.008, 0.039, 0.041, 0.042, 0.06, 0.074, 0.205, 0.212, 0.216, np.nan, 0.5, 0.9, 0.041])
fdr_demo = {'p': to_list(p_demo), 'alpha': 0.05, **fdr(p_demo, 0.05)}

# Welch's t test on two small samples straight from scipy.
wa = [19.2, 21.5, 20.1, 22.8, 18.9, 21.1]
wb = [17.0, 18.4, 16.2, 19.9, 17.7, 16.8, 18.1, 20.5]
welch = stats.ttest_ind(wa, wb, equal_var=False)
one = stats.ttest_1samp(wa, 20.0)

comp = np.array([c for c in cases if c['name'] == 'warm composite, peak + 1..3, minus neutral'][0]['values'], dtype=float)
reg = np.array([c for c in cases if c['name'] == 'regression, lag 2'][0]['values'], dtype=float)
w = areas(LAT, LON.size)
pattern_ref = pattern(comp, reg, w)

out = {
    'source': 'common/test-fixtures/scripts/maps_reference.py (numpy, xarray, scipy.stats, statsmodels.stats.multitest)',
    'field': {'start': name(FIELD_START), 'lat': LAT.tolist(), 'lon': LON.tolist(), 'values': to_list(field)},
    'index': {'start': name(INDEX_START), 'values': to_list(index)},
    'events': EVENTS,
    'cases': cases,
    'fdrDemo': fdr_demo,
    'welch': {'a': wa, 'b': wb, 't': float(welch.statistic), 'p': float(welch.pvalue), 'oneSampleMu': 20.0, 'oneSampleT': float(one.statistic), 'oneSampleP': float(one.pvalue)},
    'pattern': {'a': 'warm composite, peak + 1..3, minus neutral', 'b': 'regression, lag 2', 'weights': w.tolist(), **pattern_ref},
}
with open(os.path.join(ROOT, 'common', 'test-fixtures', 'maps-reference.json'), 'w') as f:
    json.dump(out, f, indent=None, separators=(',', ':'))

# The same field as a NetCDF-4 file: descending latitudes, longitudes −180…180, float32 with a fill value.
with netCDF4.Dataset(os.path.join(ROOT, 'server', 'test', 'fixtures', 'netcdf', 'maps-field.nc'), 'w', format='NETCDF4') as ds:
    ds.title = 'fictional field for the maps tests (synthetic, seeded)'
    ds.Conventions = 'CF-1.11'
    ds.createDimension('time', None)
    ds.createDimension('lat', LAT.size)
    ds.createDimension('lon', LON.size)
    t = ds.createVariable('time', 'f8', ('time',))
    t.units = 'days since 2000-01-01'
    t.calendar = 'standard'
    t.standard_name = 'time'
    t[:] = [(np.datetime64(f'{name(m)}-15') - np.datetime64('2000-01-01')).astype(int) for m in MONTHS]
    la = ds.createVariable('lat', 'f4', ('lat',))
    la.units = 'degrees_north'
    la.standard_name = 'latitude'
    la[:] = LAT
    lo = ds.createVariable('lon', 'f4', ('lon',))
    lo.units = 'degrees_east'
    lo.standard_name = 'longitude'
    lo[:] = LON
    v = ds.createVariable('dic', 'f4', ('time', 'lat', 'lon'), fill_value=np.float32(-9999.0))
    v.units = 'mol m-2'
    v.long_name = 'fictional carbon amount per area'
    v[:] = np.ma.masked_invalid(field.astype(np.float32))
print('wrote', len(cases), 'cases')
