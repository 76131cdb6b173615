#!/usr/bin/python3
"""Reference values for the joint trend + monthly-means fit of anomaly(detrend: true) (issue 14, item 4).

Run with Debian's Python: /usr/bin/python3 joint-trend-season.py > ../joint-trend-season.json
Library: statsmodels 0.13.5 OLS of y on 12 month dummies and t (month index), no separate constant
(Thoning, Tans & Komhyr 1989, J. Geophys. Res. 94(D6):8549-8565 fit CO2 this way).
Series: a seeded CO2-like series (trend 0.125 per month, seasonal cycle, AR(1) noise, a gap) that
starts in March, written out in full; and the Nino 1+2 table of elnino-nino12-1950-2010.csv.
For each: slope per month, the 12 monthly intercepts (value at month index 0, January first), and
the residuals (null at gaps). The sequential method (climatology of the base period first, then an
OLS line) is given for comparison: its calendar-month means of the result are not zero.
"""
import json
import os
import numpy as np
import statsmodels.api as sm

HERE = os.path.dirname(os.path.abspath(__file__))


def fit(values, start_month):
    y = np.array([np.nan if v is None else v for v in values], dtype=float)
    i = np.arange(len(y))
    cal = (start_month + i) % 12
    ok = ~np.isnan(y)
    X = np.column_stack([(cal == m).astype(float) for m in range(12)] + [i.astype(float)])
    res = sm.OLS(y[ok], X[ok]).fit()
    resid = np.full(len(y), np.nan)
    resid[ok] = res.resid
    month_means = [float(np.nanmean(resid[cal == m])) for m in range(12)]
    return {
        'slopePerMonth': res.params[12], 'monthlyIntercepts': list(res.params[:12]),
        'residuals': [None if np.isnan(v) else round(float(v), 12) for v in resid],
        'residualCalendarMonthMeans': month_means,
    }


def sequential_month_means(values, start_month):
    y = np.array([np.nan if v is None else v for v in values], dtype=float)
    i = np.arange(len(y))
    cal = (start_month + i) % 12
    clim = np.array([np.nanmean(y[cal == m]) for m in range(12)])
    a = y - clim[cal]
    ok = ~np.isnan(a)
    line = sm.OLS(a[ok], sm.add_constant(i[ok])).fit()
    d = a - (line.params[0] + line.params[1] * i)
    return [float(np.nanmean(d[cal == m])) for m in range(12)]


rng = np.random.default_rng(1989)
noise = 0.0
co2 = []
for i in range(180):
    noise = 0.5 * noise + 0.3 * rng.standard_normal()
    month = (2 + i) % 12
    co2.append(round(315 + 0.125 * i + 3 * np.cos(2 * np.pi * (month - 4) / 12) + 0.8 * np.sin(4 * np.pi * month / 12) + noise, 6))
co2[17] = None

lines = open(os.path.join(HERE, '..', 'elnino-nino12-1950-2010.csv')).read().strip().split('\n')[1:]
nino = [float(v) for l in lines for v in l.split(',')[1:]]

out = {
    'source': 'common/test-fixtures/scripts/joint-trend-season.py (statsmodels 0.13.5 OLS with month dummies)',
    'co2Like': {'start': '1960-03', 'values': co2, **fit(co2, 2), 'sequentialCalendarMonthMeans': sequential_month_means(co2, 2)},
    'nino12': {'start': '1950-01', **fit(nino, 0), 'sequentialCalendarMonthMeans': sequential_month_means(nino, 0)},
}
print(json.dumps(out, indent=1, default=float))
