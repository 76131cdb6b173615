#!/usr/bin/python3
"""Recomputes the check values that engine and server tests quote, so that every one has its origin in the repository.

Run with Debian's Python (python3-numpy, python3-scipy, python3-cftime):
    /usr/bin/python3 common/test-fixtures/scripts/check_values.py > common/test-fixtures/check-values.json
Tests do not run this script; they cite `common/test-fixtures/README.md` ("Check values") and this file's output.
"""
import json
import math
from datetime import datetime

import cftime
import numpy
import scipy
from scipy import stats


def t_of_r(r, n):
    # t = r·sqrt((n − 2)/(1 − r²)), n − 2 degrees of freedom (any statistics handbook; e.g. Wilks 2011, §5.2).
    return r * math.sqrt((n - 2) / (1 - r * r))


def two_sided_p(r, n):
    return float(2 * stats.t.sf(abs(t_of_r(r, n)), n - 2))


def n_eff(n, r1x, r1y):
    # Bretherton et al. (1999), J. Climate 12:1990, eq. 31: N_eff = N (1 − r1x r1y) / (1 + r1x r1y).
    return n * (1 - r1x * r1y) / (1 + r1x * r1y)


R_KM = 6371.0


def cell_area_km2(lat1, lat2, dlon_deg):
    # A = R²·Δλ·(sin φ2 − sin φ1) on a sphere.
    return R_KM**2 * math.radians(dlon_deg) * (math.sin(math.radians(lat2)) - math.sin(math.radians(lat1)))


def decoded(value, units, calendar):
    d = cftime.num2date(value, units, calendar=calendar)
    return f'{d.year:04d}-{d.month:02d}-{d.day:02d}'


values = {
    'versions': {'numpy': numpy.__version__, 'scipy': scipy.__version__, 'cftime': cftime.__version__},
    'significance': {
        'nEff_N120_r08_r06': round(n_eff(120, 0.8, 0.6), 4),
        't_r03_N120': round(t_of_r(0.3, 120), 4),
        'p_r03_N120': round(two_sided_p(0.3, 120), 6),
        't_r03_nEff42.162': round(t_of_r(0.3, 42.162), 4),
        'p_r03_nEff42.162': round(two_sided_p(0.3, 42.162), 4),
        't_r05_n30': round(t_of_r(0.5, 30), 4),
        'p_r05_n30': round(two_sided_p(0.5, 30), 5),
    },
    'units': {
        # CIAAW conventional atomic weight of carbon, 12.011 g/mol.
        'mol_C_per_Pg_C': 1e15 / 12.011,
        # Julian year (IAU): 365.25 days.
        'pg_per_yr_over_2001_constant_1': 365 / 365.25,
    },
    'sphere_R6371km': {
        'total_km2': round(4 * math.pi * R_KM**2, 2),
        'cell_0_1N_km2': round(cell_area_km2(0, 1, 1), 3),
        'cell_89_90N_km2': round(cell_area_km2(89, 90, 1), 3),
        'band_5S_5N_fraction': round(math.sin(math.radians(5)), 7),
        'globe_0_100m_km3': round(4 * math.pi * R_KM**2 * 0.1, 2),
    },
    'cf_time': {
        'days_since_2000_01_01': {
            cal: {str(v): decoded(v, 'days since 2000-01-01', cal) for v in (59, 365)} for cal in ('standard', 'noleap', '360_day')
        },
        '2000_01_01_in_days_since_1950_01_01': {
            cal: int(cftime.date2num(cftime.datetime(2000, 1, 1, calendar=cal), 'days since 1950-01-01', calendar=cal))
            for cal in ('standard', 'noleap', '360_day')
        },
    },
}

print(json.dumps(values, indent=2))
