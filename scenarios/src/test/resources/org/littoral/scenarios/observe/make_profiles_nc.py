# Writes test profile files with python3-netcdf4 (Debian): one file per flight and a CF-1.8 profile
# collection (featureType profile, orthogonal multidimensional), each as netCDF-3 (64-bit offset) and netCDF-4.
# Invented data for tests. Usage: make_profiles_nc.py OUTDIR
import sys, os
import numpy as np
import netCDF4 as nc

out = sys.argv[1]
KNOT = 1852.0 / 3600.0
base = 'seconds since 2026-12-04 13:00:00 UTC'   # 2026-12-05 00:00 at UTC+11

def state(z, local_h):
    onshore = local_h > 12.17
    t_k = 293.15 - 0.0098 * z - (1.0 if onshore else 0.0)
    p_pa = 101300.0 * np.exp(-z / 8400.0)
    ws = np.full_like(z, 5.0 if onshore else 4.0)
    wd = np.full_like(z, 135.0 if onshore else 300.0)
    return t_k, p_pa, ws, wd

for fmt, tag in (('NETCDF3_64BIT_OFFSET', 'nc3'), ('NETCDF4', 'nc4')):
    d = os.path.join(out, 'flights-' + tag)
    os.makedirs(d, exist_ok=True)
    for f in range(21):
        local_h = 7.0 + 0.5 * f
        s = np.arange(240.0)
        z = np.where(s < 134, 3.0 * s, np.maximum(0.0, 400.0 - 5.0 * (s - 134)))
        t_k, p_pa, ws, wd = state(z, local_h)
        ds = nc.Dataset(os.path.join(d, 'flight-%02d.nc' % f), 'w', format=fmt)
        ds.createDimension('time', len(s))
        def var(name, data, units, std, fill=-9999.0, dtype='f4'):
            v = ds.createVariable(name, dtype, ('time',), fill_value=fill)
            v.units = units
            v.standard_name = std
            v[:] = data
            return v
        t = var('time', local_h * 3600.0 + s, base, 'time', fill=None, dtype='f8')
        t.calendar = 'standard'
        var('alt', z, 'm', 'height')
        var('ta', t_k, 'K', 'air_temperature')
        var('pa', p_pa, 'Pa', 'air_pressure', dtype='f8')
        rh = var('hur', np.full_like(z, 0.6), '1', 'relative_humidity')
        rh[7] = np.ma.masked                      # a fill value to be masked
        var('ws', ws / KNOT, 'knots', 'wind_speed')
        var('wd', wd, 'degree', 'wind_from_direction')
        ds.Conventions = 'CF-1.8'
        ds.site = 'ridge-3km'
        ds.comment = 'INVENTED test data'
        ds.close()

    # CF profile collection: time(profile), height(z), data(profile, z); site names as characters.
    ds = nc.Dataset(os.path.join(out, 'collection-' + tag + '.nc'), 'w', format=fmt)
    nprof, nz = 42, 80
    ds.createDimension('profile', nprof)
    ds.createDimension('z', nz)
    ds.createDimension('name_strlen', 12)
    zc = 2.5 + 5.0 * np.arange(nz)
    zv = ds.createVariable('z', 'f4', ('z',))
    zv.units = 'm'; zv.standard_name = 'height'; zv.positive = 'up'; zv[:] = zc
    tv = ds.createVariable('time', 'f8', ('profile',))
    tv.units = base; tv.standard_name = 'time'
    sv = ds.createVariable('site', 'S1', ('profile', 'name_strlen'))
    sv.cf_role = 'profile_id'
    names = []
    times = []
    for i in range(nprof):
        site = 'ridge-3km' if i % 2 == 0 else 'flats-20km'
        names.append(site)
        times.append((7.0 + 0.5 * (i // 2)) * 3600.0)
    tv[:] = np.array(times)
    sv[:] = nc.stringtochar(np.array([n.ljust(12) for n in names], 'S12'))
    def pvar(name, units, std):
        v = ds.createVariable(name, 'f4', ('profile', 'z'), fill_value=-9999.0)
        v.units = units; v.standard_name = std; v.coordinates = 'time z'
        return v
    ta = pvar('temperature', 'degC', 'air_temperature')
    pr = pvar('pressure', 'hPa', 'air_pressure')
    hu = pvar('mixing_ratio', 'kg kg-1', 'humidity_mixing_ratio')
    sp = pvar('speed', 'm s-1', 'wind_speed')
    di = pvar('direction', 'degree', 'wind_from_direction')
    for i in range(nprof):
        t_k, p_pa, ws, wd = state(zc, times[i] / 3600.0)
        ta[i, :] = t_k - 273.15
        pr[i, :] = p_pa / 100.0
        hu[i, :] = np.full(nz, 0.008)
        sp[i, :] = ws
        di[i, :] = wd
    ta[3, 10] = np.ma.masked
    ds.featureType = 'profile'
    ds.Conventions = 'CF-1.8'
    ds.comment = 'INVENTED test data'
    ds.close()
print('ok')
