#!/usr/bin/python3
"""Reference values for trend() with the Santer et al. (2000) adjustment (issue 14, item 5).

Run with Debian's Python: /usr/bin/python3 trend-santer.py > ../trend-santer.json
Libraries: numpy, statsmodels 0.13.5 (OLS, Newey-West HAC), scipy 1.10 (t distribution).
Series: (1) Nino 1+2 anomalies against 1971-2000 from elnino-nino12-1950-2010.csv; (2) a seeded
AR(1) series (phi 0.7) plus a trend of 0.02 per month, with two gaps, written out in full.
Time in years from the first month (month i -> i/12), as the engine does.
"""
import json
import os
import numpy as np
import scipy.stats
import statsmodels.api as sm

HERE = os.path.dirname(os.path.abspath(__file__))


def nino_anomalies():
    lines = open(os.path.join(HERE, '..', 'elnino-nino12-1950-2010.csv')).read().strip().split('\n')[1:]
    years = np.array([int(l.split(',')[0]) for l in lines])
    table = np.array([[float(v) for v in l.split(',')[1:]] for l in lines])
    base = (years >= 1971) & (years <= 2000)
    return (table - table[base].mean(axis=0)).flatten()


def reference(values):
    y = np.array([np.nan if v is None else v for v in values], dtype=float)
    t = np.arange(len(y)) / 12.0
    ok = ~np.isnan(y)
    fit = sm.OLS(y[ok], sm.add_constant(t[ok])).fit()
    # Residuals on the full time axis (NaN at gaps); r1 by the NIST StRD definition, gaps break pairs.
    e = np.full(len(y), np.nan)
    e[ok] = y[ok] - fit.predict(sm.add_constant(t[ok]))
    d = e - np.nanmean(e)
    prod = d[1:] * d[:-1]
    r1 = np.nansum(prod) / np.nansum(d ** 2)
    n = int(ok.sum())
    neff = n * (1 - r1) / (1 + r1)
    se_adj = fit.bse[1] * np.sqrt((n - 2) / (neff - 2))
    t_adj = fit.params[1] / se_adj
    hac = sm.OLS(y[ok], sm.add_constant(t[ok])).fit(cov_type='HAC', cov_kwds={'maxlags': 12})
    return {
        'slope': fit.params[1], 'intercept': fit.params[0], 'slopeStdErr': fit.bse[1], 'tOls': fit.tvalues[1], 'n': n,
        'r1Residuals': r1, 'nEffResiduals': neff, 'slopeStdErrAdjusted': se_adj, 'tAdjusted': t_adj,
        'pAdjusted': 2 * scipy.stats.t.sf(abs(t_adj), neff - 2),
        'secondOpinionNeweyWest12': {'slopeStdErr': hac.bse[1], 't': hac.tvalues[1]},
    }


rng = np.random.default_rng(2000)
a = 0.0
synthetic = []
for i in range(240):
    a = 0.7 * a + rng.standard_normal()
    synthetic.append(round(0.02 * i + a, 6))
synthetic[50] = None
synthetic[51] = None
synthetic[200] = None

out = {
    'source': 'common/test-fixtures/scripts/trend-santer.py (numpy, statsmodels 0.13.5 OLS and HAC, scipy 1.10)',
    'nino12Anomalies1971to2000': {'start': '1950-01', **reference(list(nino_anomalies()))},
    'synthetic': {'start': '2000-01', 'values': synthetic, **reference(synthetic)},
}
print(json.dumps(out, indent=1, default=float))
