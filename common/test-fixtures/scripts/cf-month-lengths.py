#!/usr/bin/python3
"""Month lengths per CF calendar from cftime, for calendarDaysInMonth() / monthDays() (issue 14, item 3).

Run with Debian's Python: /usr/bin/python3 cf-month-lengths.py > ../cf-month-lengths.json
Library: cftime 1.6.2. Length of month m = (first day of the next month) - (first day of m), in days,
for each calendar and each listed year (Julian/Gregorian leap rules, the 1582 switch year excluded
for `standard` because October 1582 lacks ten days).
"""
import json
import cftime

CALENDARS = ['standard', 'gregorian', 'proleptic_gregorian', 'julian', 'noleap', '365_day', 'all_leap', '366_day', '360_day']
YEARS = [1500, 1600, 1700, 1900, 1996, 1997, 2000, 2100, 2400]

out = {'source': 'common/test-fixtures/scripts/cf-month-lengths.py (cftime 1.6.2)', 'lengths': {}}
for cal in CALENDARS:
    out['lengths'][cal] = {}
    for year in YEARS:
        days = []
        for m in range(1, 13):
            a = cftime.datetime(year, m, 1, calendar=cal)
            b = cftime.datetime(year + (m == 12), 1 if m == 12 else m + 1, 1, calendar=cal)
            days.append((b - a).days)
        out['lengths'][cal][str(year)] = days
print(json.dumps(out, indent=1))
