#!/usr/bin/env python3
"""Writes the native-grid fixtures of issue 16 and their reference values.

Run from the repository root:  /usr/bin/python3 common/test-fixtures/scripts/grids_reference.py
Needs numpy, netCDF4-python and xarray (Debian python3-numpy, python3-netcdf4, python3-xarray).
Everything is synthetic and seeded (numpy default_rng(16)); the output is committed, tests never run Python.

Files written to common/test-fixtures/grids/:
  grids_budget.nc     a rotated-pole curvilinear grid (2-D lat/lon with `coordinates`, vertices_latitude/longitude,
                      areacello known analytically, cell_measures), z-levels with lev_bnds in cm (positive down),
                      partial bottom cells (deptho, thkcello, volcello), DIC and a conservative budget
  grids_regions.nc    an integer region mask on the same grid (flag_values/flag_meanings)
  grids_no_areas.nc   a field on 2-D coordinates with no cell_measures (must be refused)
  grids_mismatch.nc   a region mask on a grid of another shape (must be refused)
  grids_tiny_budget.nc  a 4 x 6 cut of grids_budget.nc over 2 months, NetCDF-3 (the route walk's upload)
  grids_no_bounds.nc  a 3-D field whose vertical axis has no bounds and no thickness variable (must be refused)
  grids_reference.json  the grid as JSON arrays (for engine tests) and the reference integrals from xarray

The grid: cells are bounded by meridians and parallels of a rotated sphere (rotated latitude -60..60 in 6 degree
steps, rotated longitude 0..360 in 10 degree steps). A rotation preserves area, so each cell's area is exactly
A = R^2 * dlambda' * (sin phi2' - sin phi1') (Snyder 1987, USGS PP 1395) and the grid covers sin(60 deg) of the
sphere. Geographic latitude/longitude of centres and vertices come from rotating back.

The budget: advection and diffusion are divergences of random face transports (mol/s) between neighbouring wet
cells (periodic in rotated longitude, closed at the rotated-latitude edges, the surface and the sea floor), so each
face's transport leaves one cell and enters the other: their global full-depth integrals vanish to rounding.
Biology, air-sea flux (top level only) and "other" are random; the tendency is their exact float64 sum.
"""
import json
import os

import numpy as np
import xarray as xr
from netCDF4 import Dataset

HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.normpath(os.path.join(HERE, '..', 'grids'))
R = 6371000.0  # the round radius of model output (m)
rng = np.random.default_rng(16)

# Rotated grid edges (degrees) and the rotation back to geographic coordinates.
PHI_E = np.arange(-60.0, 60.0 + 1e-9, 6.0)
LAM_E = np.arange(0.0, 360.0 + 1e-9, 10.0)
NY, NX = len(PHI_E) - 1, len(LAM_E) - 1
TILT, TURN = np.deg2rad(35.0), np.deg2rad(-140.0)


def to_geographic(lam, phi):
    lam, phi = np.deg2rad(lam), np.deg2rad(phi)
    x, y, z = np.cos(phi) * np.cos(lam), np.cos(phi) * np.sin(lam), np.sin(phi)
    # rotate about the y axis by TILT, then about the z axis by TURN
    x, z = x * np.cos(TILT) + z * np.sin(TILT), -x * np.sin(TILT) + z * np.cos(TILT)
    x, y = x * np.cos(TURN) - y * np.sin(TURN), x * np.sin(TURN) + y * np.cos(TURN)
    lat = np.rad2deg(np.arcsin(np.clip(z, -1, 1)))
    lon = np.rad2deg(np.arctan2(y, x))  # -180..180
    return lat, lon


phi_c = 0.5 * (PHI_E[:-1] + PHI_E[1:])
lam_c = 0.5 * (LAM_E[:-1] + LAM_E[1:])
LAMC, PHIC = np.meshgrid(lam_c, phi_c)
lat, lon = to_geographic(LAMC, PHIC)
# vertices counter-clockwise in the rotated frame: (w,s) (e,s) (e,n) (w,n), as CMIP's vertices_* order them
vlam = np.stack([np.broadcast_to(LAM_E[None, :-1], (NY, NX)), np.broadcast_to(LAM_E[None, 1:], (NY, NX)),
                 np.broadcast_to(LAM_E[None, 1:], (NY, NX)), np.broadcast_to(LAM_E[None, :-1], (NY, NX))], axis=-1)
vphi = np.stack([np.broadcast_to(PHI_E[:-1, None], (NY, NX)), np.broadcast_to(PHI_E[:-1, None], (NY, NX)),
                 np.broadcast_to(PHI_E[1:, None], (NY, NX)), np.broadcast_to(PHI_E[1:, None], (NY, NX))], axis=-1)
vlat, vlon = to_geographic(vlam, vphi)
area = (R ** 2) * np.deg2rad(10.0) * (np.sin(np.deg2rad(PHI_E[1:])) - np.sin(np.deg2rad(PHI_E[:-1])))
area = np.broadcast_to(area[:, None], (NY, NX)).copy()

# Vertical: 4 z-levels, bounds written in centimetres (as some models do), positive down.
LEV_BNDS_M = np.array([[0.0, 10.0], [10.0, 50.0], [50.0, 150.0], [150.0, 400.0]])
NZ = len(LEV_BNDS_M)
deptho = rng.uniform(30.0, 400.0, (NY, NX))
land = rng.uniform(size=(NY, NX)) < 0.15
deptho[land] = np.nan
top, bot = LEV_BNDS_M[:, 0][:, None, None], LEV_BNDS_M[:, 1][:, None, None]
thk = np.clip(np.minimum(bot, np.where(np.isnan(deptho), -np.inf, deptho)[None]) - top, 0.0, None)
wet = thk > 0
volume = thk * area[None]

NT = 3
time = np.array([15.5, 45.0, 74.5])
time_bnds = np.array([[0.0, 31.0], [31.0, 59.0], [59.0, 90.0]])


def flux_divergence(scale):
    """Rates (mol m-3 s-1) from random antisymmetric face transports between wet neighbours."""
    net = np.zeros((NT, NZ, NY, NX))
    # east faces, periodic in rotated longitude
    t = rng.normal(0.0, scale, (NT, NZ, NY, NX)) * (wet & np.roll(wet, -1, axis=2))
    net -= t
    net += np.roll(t, 1, axis=3)
    # north faces, closed at the last row
    t = rng.normal(0.0, scale, (NT, NZ, NY, NX)) * (wet & np.roll(wet, -1, axis=1))
    t[:, :, -1, :] = 0.0
    net -= t
    net += np.roll(t, 1, axis=2)
    # faces below, closed at the floor
    t = rng.normal(0.0, scale, (NT, NZ, NY, NX)) * (wet & np.roll(wet, -1, axis=0))
    t[:, -1] = 0.0
    net -= t
    net += np.roll(t, 1, axis=1)
    return np.where(wet[None], net / np.where(wet, volume, 1.0)[None], np.nan)


adv = flux_divergence(5e4)
dif = flux_divergence(1e4)
bio = np.where(wet[None], rng.normal(0.0, 2e-9, (NT, NZ, NY, NX)), np.nan)
fgco2 = np.where(np.isnan(deptho)[None], np.nan, rng.normal(1e-8, 1e-8, (NT, NY, NX)))  # mol m-2 s-1, into the ocean
airsea = np.full((NT, NZ, NY, NX), np.nan)
airsea[:, 1:] = np.where(wet[None, 1:], 0.0, np.nan)
airsea[:, 0] = np.where(wet[0][None], fgco2 / np.where(wet[0], thk[0], 1.0)[None], np.nan)
other = np.where(wet[None], rng.normal(0.0, 1e-10, (NT, NZ, NY, NX)), np.nan)
tend = adv + dif + bio + airsea + other
dissic = np.where(wet[None], rng.uniform(2.0, 2.3, (NT, NZ, NY, NX)), np.nan)

# Regions: 1 tropical Pacific (|lat| <= 15, 120E..80W), 2 north of 15N elsewhere, 3 the rest; 0 on land.
lon360 = np.mod(lon, 360.0)
codes = np.where(np.abs(lat) <= 15.0, np.where((lon360 >= 120.0) & (lon360 < 280.0), 1, 3), np.where(lat > 15.0, 2, 3))
codes = np.where(np.isnan(deptho), 0, codes).astype(np.int32)
REGION_NAMES = ['tropical_pacific', 'northern_band', 'rest_of_ocean']


def horizontal(ds):
    ds.createDimension('y', NY)
    ds.createDimension('x', NX)
    ds.createDimension('nvertex', 4)
    v = ds.createVariable('lat', 'f8', ('y', 'x'))
    v.standard_name, v.units, v.bounds = 'latitude', 'degrees_north', 'vertices_latitude'
    v[:] = lat
    v = ds.createVariable('lon', 'f8', ('y', 'x'))
    v.standard_name, v.units, v.bounds = 'longitude', 'degrees_east', 'vertices_longitude'
    v[:] = lon
    v = ds.createVariable('vertices_latitude', 'f8', ('y', 'x', 'nvertex'))
    v.units = 'degrees_north'
    v[:] = vlat
    v = ds.createVariable('vertices_longitude', 'f8', ('y', 'x', 'nvertex'))
    v.units = 'degrees_east'
    v[:] = vlon


def time_axis(ds):
    ds.createDimension('time', None)
    ds.createDimension('bnds', 2)
    v = ds.createVariable('time', 'f8', ('time',))
    v.units, v.calendar, v.axis, v.bounds = 'days since 2000-01-01', 'noleap', 'T', 'time_bnds'
    v[:] = time
    ds.createVariable('time_bnds', 'f8', ('time', 'bnds'))[:] = time_bnds


def write_budget(path):
    with Dataset(path, 'w', format='NETCDF4') as ds:
        ds.Conventions = 'CF-1.11'
        ds.title = 'Upwell synthetic native-grid carbon budget (issue 16 fixture; invented data)'
        horizontal(ds)
        time_axis(ds)
        ds.createDimension('lev', NZ)
        v = ds.createVariable('lev', 'f8', ('lev',))
        v.units, v.positive, v.axis, v.bounds, v.standard_name = 'centimeters', 'down', 'Z', 'lev_bnds', 'depth'
        v[:] = LEV_BNDS_M.mean(axis=1) * 100.0
        v = ds.createVariable('lev_bnds', 'f8', ('lev', 'bnds'))
        v.units = 'centimeters'
        v[:] = LEV_BNDS_M * 100.0
        v = ds.createVariable('areacello', 'f8', ('y', 'x'))
        v.standard_name, v.units, v.coordinates = 'cell_area', 'm2', 'lat lon'
        v[:] = area
        v = ds.createVariable('deptho', 'f8', ('y', 'x'), fill_value=1e20)
        v.standard_name, v.units, v.coordinates = 'sea_floor_depth_below_geoid', 'm', 'lat lon'
        v[:] = np.ma.masked_invalid(deptho)
        v = ds.createVariable('thkcello', 'f8', ('lev', 'y', 'x'))
        v.standard_name, v.units, v.coordinates = 'cell_thickness', 'm', 'lat lon'
        v.cell_measures = 'area: areacello'
        v[:] = thk
        v = ds.createVariable('volcello', 'f8', ('lev', 'y', 'x'))
        v.standard_name, v.units, v.coordinates = 'ocean_volume', 'm3', 'lat lon'
        v[:] = volume
        v = ds.createVariable('fgco2', 'f8', ('time', 'y', 'x'), fill_value=1e20)
        v.units, v.coordinates, v.cell_measures = 'mol m-2 s-1', 'lat lon', 'area: areacello'
        v.long_name = 'air-sea CO2 flux as carbon, positive into the ocean'
        v[:] = np.ma.masked_invalid(fgco2)
        for name, data, long_name in [('dissic', dissic, 'dissolved inorganic carbon'),
                                      ('dic_tend', tend, 'DIC tendency'), ('dic_adv', adv, 'DIC advection'),
                                      ('dic_dif', dif, 'DIC diffusion'), ('dic_bio', bio, 'DIC biology'),
                                      ('dic_airsea', airsea, 'DIC air-sea flux'), ('dic_other', other, 'DIC other')]:
            v = ds.createVariable(name, 'f8', ('time', 'lev', 'y', 'x'), fill_value=1e20)
            v.units = 'mol m-3' if name == 'dissic' else 'mol m-3 s-1'
            v.long_name, v.coordinates = long_name, 'lat lon'
            v.cell_measures = 'area: areacello volume: volcello'
            v[:] = np.ma.masked_invalid(data)


def write_regions(path, ny=NY, nx=NX, data=codes):
    with Dataset(path, 'w', format='NETCDF4') as ds:
        ds.Conventions = 'CF-1.11'
        ds.title = 'Upwell synthetic region mask (issue 16 fixture)'
        if ny == NY and nx == NX:
            horizontal(ds)
        else:
            ds.createDimension('y', ny)
            ds.createDimension('x', nx)
        v = ds.createVariable('basin', 'i4', ('y', 'x'))
        v.flag_values = np.array([1, 2, 3], dtype=np.int32)
        v.flag_meanings = ' '.join(REGION_NAMES)
        if ny == NY and nx == NX:
            v.coordinates = 'lat lon'
        v[:] = data


def write_no_areas(path):
    with Dataset(path, 'w', format='NETCDF4') as ds:
        horizontal(ds)
        time_axis(ds)
        v = ds.createVariable('fgco2', 'f8', ('time', 'y', 'x'))
        v.units, v.coordinates = 'mol m-2 s-1', 'lat lon'
        v[:] = np.nan_to_num(fgco2)


def write_no_bounds(path):
    with Dataset(path, 'w', format='NETCDF4') as ds:
        horizontal(ds)
        time_axis(ds)
        ds.createDimension('lev', NZ)
        v = ds.createVariable('lev', 'f8', ('lev',))
        v.units, v.positive, v.axis = 'm', 'down', 'Z'
        v[:] = LEV_BNDS_M.mean(axis=1)
        v = ds.createVariable('areacello', 'f8', ('y', 'x'))
        v.units = 'm2'
        v[:] = area
        v = ds.createVariable('dissic', 'f8', ('time', 'lev', 'y', 'x'))
        v.units, v.coordinates, v.cell_measures = 'mol m-3', 'lat lon', 'area: areacello'
        v[:] = np.nan_to_num(dissic)


os.makedirs(OUT, exist_ok=True)
write_budget(os.path.join(OUT, 'grids_budget.nc'))
write_regions(os.path.join(OUT, 'grids_regions.nc'))
write_regions(os.path.join(OUT, 'grids_mismatch.nc'), NY - 1, NX, codes[:-1])
write_no_areas(os.path.join(OUT, 'grids_no_areas.nc'))
write_no_bounds(os.path.join(OUT, 'grids_no_bounds.nc'))


def write_tiny(src, path, keep):
    """A small cut of a file (the route walk uploads one per world): every variable sliced on y, x and time."""
    with Dataset(src) as a, Dataset(path, 'w', format='NETCDF3_64BIT_OFFSET') as b:
        b.setncatts({k: a.getncattr(k) for k in a.ncattrs()})
        for name, d in a.dimensions.items():
            size = len(range(*keep[name].indices(len(d)))) if name in keep else len(d)
            b.createDimension(name, None if d.isunlimited() else size)
        for name, v in a.variables.items():
            fill = v.getncattr('_FillValue') if '_FillValue' in v.ncattrs() else None
            w = b.createVariable(name, v.dtype, v.dimensions, fill_value=fill)
            w.setncatts({k: v.getncattr(k) for k in v.ncattrs() if k != '_FillValue'})
            w[:] = v[tuple(keep.get(dim, slice(None)) for dim in v.dimensions)]


write_tiny(os.path.join(OUT, 'grids_budget.nc'), os.path.join(OUT, 'grids_tiny_budget.nc'), {'y': slice(8, 12), 'x': slice(0, 6), 'time': slice(0, 2)})

# ---- reference values, computed with xarray from the files just written ----
ds = xr.open_dataset(os.path.join(OUT, 'grids_budget.nc'), decode_times=False)
rg = xr.open_dataset(os.path.join(OUT, 'grids_regions.nc'))
A = ds['areacello']
H = 100.0
# thickness within 0-H per cell: the top of each cell is the sum of the thicknesses above it
thk_x = ds['thkcello']
top_x = thk_x.cumsum('lev') - thk_x
thk_h = (H - top_x).clip(min=0.0)
thk_h = xr.where(thk_h < thk_x, thk_h, thk_x)
vol_full = (A * thk_x).fillna(0.0)
vol_h = (A * thk_h).fillna(0.0)


def series(x):
    return [float(v) for v in np.asarray(x.values).ravel()]


TERMS = ['dic_tend', 'dic_adv', 'dic_dif', 'dic_bio', 'dic_airsea', 'dic_other']
regions = {}
for code, name in zip([1, 2, 3], REGION_NAMES):
    m = rg['basin'] == code
    entry = {
        'code': code,
        'cells': int(m.sum()),
        'area_m2': float(A.where(m).sum()),
        'fgco2_integral_mol_s': series(ds['fgco2'].where(m).weighted(A.fillna(0)).sum(('y', 'x'))),
        'fgco2_mean_mol_m2_s': series(ds['fgco2'].where(m).weighted(A.where(m & ds['fgco2'].notnull().any('time')).fillna(0)).mean(('y', 'x'))),
        'volume_full_m3': float(vol_full.where(m).sum()),
        'volume_0_100m_m3': float(vol_h.where(m).sum()),
        'full_depth_mol_s': {},
        'top_100m_mol_s': {},
    }
    for t in TERMS:
        entry['full_depth_mol_s'][t] = series(ds[t].where(m).weighted(vol_full).sum(('lev', 'y', 'x')))
        entry['top_100m_mol_s'][t] = series(ds[t].where(m).weighted(vol_h).sum(('lev', 'y', 'x')))
    entry['inventory_full_mol'] = series(ds['dissic'].where(m).weighted(vol_full).sum(('lev', 'y', 'x')))
    entry['inventory_0_100m_mol'] = series(ds['dissic'].where(m).weighted(vol_h).sum(('lev', 'y', 'x')))
    regions[name] = entry

glob = {t: series(ds[t].weighted(vol_full).sum(('lev', 'y', 'x'))) for t in TERMS}
# Boxes selected in numpy (an implementation independent of the engine's), integrated with xarray.
BOXES = {'nino34': (-5, 5, -170, -120), 'nino4': (-5, 5, 160, -150), 'nino3': (-5, 5, -150, -90), 'nino12': (-10, 0, -90, -80)}
boxes = {}
for bid, (s, n, w, e) in BOXES.items():
    width = (e - w) % 360 or 360
    inside = (lat >= s) & (lat <= n) & (np.mod(lon - w, 360.0) < width)
    m = xr.DataArray(inside, dims=('y', 'x'))
    boxes[bid] = {'cells': int(inside.sum()),
                  'fgco2_integral_mol_s': series(ds['fgco2'].where(m).weighted(A.fillna(0)).sum(('y', 'x')))}

reference = {
    'script': 'common/test-fixtures/scripts/grids_reference.py',
    'library': f'xarray {xr.__version__} DataArray.weighted(...).sum(); numpy {np.__version__}',
    'radius_m': R,
    'ny': NY, 'nx': NX, 'nz': NZ, 'nt': NT,
    'depth_limit_m': H,
    'band_area_m2': 4 * np.pi * R ** 2 * np.sin(np.deg2rad(60.0)),
    'grid': {
        'lat': series(ds['lat']), 'lon': series(ds['lon']), 'area': series(A),
        'codes': [int(c) for c in codes.ravel()],
        'thkcello': series(ds['thkcello']),
        'fgco2_t0': [None if np.isnan(v) else float(v) for v in fgco2[0].ravel()],
        'dissic_t0': [None if np.isnan(v) else float(v) for v in dissic[0].ravel()],
    },
    'regions': regions,
    'global_full_depth_mol_s': glob,
    'boxes': boxes,
}
with open(os.path.join(OUT, 'grids_reference.json'), 'w') as f:
    json.dump(reference, f, indent=None, separators=(',', ':'))
for name in sorted(os.listdir(OUT)):
    print(name, os.path.getsize(os.path.join(OUT, name)))
