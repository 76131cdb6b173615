import { useMemo } from 'react';
import type { MapResponse } from '@upwell/common';
import { legendStops } from './colour-scale';
import { degreeTicks, latitudeLabel, longitudeLabel } from './degree-label';
import { landRings } from './land-rings';
import { mapRaster } from './map-raster';
import { pngDataUrl } from './png-data-url';
import { scaleLimits } from './scale-limits';

/** Props of FieldMap: a map answer of POST /api/fields/:fieldId/maps and how to colour it. */
export interface FieldMapProps {
  map: Pick<MapResponse, 'lat' | 'lon' | 'values' | 'significant' | 'units'>;
  /** 'diverging' (anomalies, composites, correlations, regressions; centred on zero) or 'sequential' (means). */
  scale: 'diverging' | 'sequential';
  /** Percentile setting the colour limits (default 98). */
  percentile?: number;
  /** Width of the map panel in CSS pixels. */
  width?: number;
  title?: string;
}

const MARGIN = { left: 44, right: 12, top: 8, bottom: 64 };

/**
 * A latitude–longitude map drawn as one raster image (one pixel per cell, never a shape per cell)
 * over land in a quiet grey and under thin Natural Earth coastlines, with degree ticks, stippling of
 * cells that pass the FDR test, and a legend that states its limits and the percentile behind them.
 */
export function FieldMap({ map, scale, percentile = 98, width = 640, title }: FieldMapProps) {
  const nlat = map.lat.length;
  const nlon = map.lon.length;
  const limits = useMemo(() => scaleLimits(map.values, scale, percentile), [map.values, scale, percentile]);
  const dLon = nlon > 1 ? (map.lon[nlon - 1] - map.lon[0]) / (nlon - 1) : 1;
  const dLat = nlat > 1 ? Math.abs(map.lat[nlat - 1] - map.lat[0]) / (nlat - 1) : 1;
  const west = map.lon[0] - dLon / 2;
  const east = map.lon[nlon - 1] + dLon / 2;
  const south = Math.min(...map.lat) - dLat / 2;
  const north = Math.max(...map.lat) + dLat / 2;
  const w = width - MARGIN.left - MARGIN.right;
  const h = Math.max(60, Math.round((w * (north - south)) / (east - west)));
  const x = (lon: number) => ((lon - west) / (east - west)) * w;
  const y = (lat: number) => ((north - lat) / (north - south)) * h;

  const image = useMemo(() => (limits ? pngDataUrl(mapRaster(map.values, map.lat, nlon, limits, scale), nlon, nlat) : null), [map.values, map.lat, nlon, nlat, limits, scale]);
  const land = useMemo(() => landPath(west, east, x, y), [west, east, w, h]); // eslint-disable-line react-hooks/exhaustive-deps
  const stipple = useMemo(() => stipplePath(map, x, y), [map, w, h]); // eslint-disable-line react-hooks/exhaustive-deps
  const fmt = (v: number) => (Math.abs(v) >= 1000 || (Math.abs(v) < 0.01 && v !== 0) ? v.toExponential(2) : String(Number(v.toPrecision(3))));
  const legendW = Math.min(260, w);
  const stops = legendStops(scale);

  return (
    <svg role="img" aria-label={title ?? 'map'} width={width} height={h + MARGIN.top + MARGIN.bottom} viewBox={`0 0 ${width} ${h + MARGIN.top + MARGIN.bottom}`} fontFamily="inherit" fontSize={11}>
      <defs>
        <clipPath id="field-map-clip"><rect width={w} height={h} /></clipPath>
        <linearGradient id="field-map-legend">{stops.map((s) => <stop key={s.offset} offset={s.offset} stopColor={s.colour} />)}</linearGradient>
      </defs>
      <g transform={`translate(${MARGIN.left},${MARGIN.top})`}>
        <g clipPath="url(#field-map-clip)">
          <path d={land} fill="#d9d9d6" stroke="none" data-layer="land" />
          {image && <image href={image} x={0} y={0} width={w} height={h} preserveAspectRatio="none" style={{ imageRendering: 'pixelated' }} data-layer="field" />}
          <path d={land} fill="none" stroke="#3a3a3a" strokeWidth={0.5} data-layer="coastline" />
          {stipple.d && <path d={stipple.d} stroke="#111" strokeWidth={stipple.dot} strokeLinecap="round" data-layer="stippling" />}
        </g>
        <rect width={w} height={h} fill="none" stroke="#555" strokeWidth={0.75} />
        {degreeTicks(west, east).map((t) => (
          <text key={`x${t}`} x={x(t)} y={h + 13} textAnchor="middle">{longitudeLabel(t)}</text>
        ))}
        {degreeTicks(south, north, Math.max(3, Math.floor(h / 28))).map((t) => (
          <text key={`y${t}`} x={-5} y={y(t) + 4} textAnchor="end">{latitudeLabel(t)}</text>
        ))}
        {limits && (
          <g transform={`translate(0,${h + 26})`} data-layer="legend">
            <rect width={legendW} height={9} fill="url(#field-map-legend)" stroke="#555" strokeWidth={0.5} />
            <text x={0} y={21} textAnchor="start">{fmt(limits[0])}</text>
            {scale === 'diverging' && <text x={legendW / 2} y={21} textAnchor="middle">0</text>}
            <text x={legendW} y={21} textAnchor="end">{fmt(limits[1])}</text>
            <text x={legendW + 10} y={8}>{map.units}</text>
            <text x={0} y={34}>
              {scale === 'diverging' ? `limits ±${fmt(limits[1])}: the ${percentile}th percentile of |value|` : `limits: the ${100 - percentile}th and ${percentile}th percentiles`}
              {map.significant ? '; dots: significant after FDR control' : ''}
            </text>
          </g>
        )}
      </g>
    </svg>
  );
}

/** Land rings projected onto the map, repeated a turn east and west so unwrapped longitudes (e.g. 135…225) find their coasts. */
function landPath(west: number, east: number, x: (lon: number) => number, y: (lat: number) => number): string {
  const parts: string[] = [];
  for (const ring of landRings()) {
    let lo = Infinity;
    let hi = -Infinity;
    for (const [lon] of ring) {
      lo = Math.min(lo, lon);
      hi = Math.max(hi, lon);
    }
    for (const shift of [-360, 0, 360]) {
      if (hi + shift < west || lo + shift > east) continue;
      parts.push('M' + ring.map(([lon, lat]) => `${x(lon + shift).toFixed(1)},${y(lat).toFixed(1)}`).join('L') + 'Z');
    }
  }
  return parts.join('');
}

/** One path of dots at significant cells, thinned to about 20,000 dots on fine grids. */
function stipplePath(map: FieldMapProps['map'], x: (lon: number) => number, y: (lat: number) => number): { d: string; dot: number } {
  const sig = map.significant;
  if (!sig) return { d: '', dot: 0 };
  const nlon = map.lon.length;
  const stride = Math.max(1, Math.ceil(Math.sqrt(sig.length / 20_000)));
  const cellW = nlon > 1 ? Math.abs(x(map.lon[1]) - x(map.lon[0])) : 4;
  const parts: string[] = [];
  for (let r = 0; r < map.lat.length; r += stride) {
    for (let i = 0; i < nlon; i += stride) if (sig[r * nlon + i]) parts.push(`M${x(map.lon[i]).toFixed(1)},${y(map.lat[r]).toFixed(1)}h0`);
  }
  return { d: parts.join(''), dot: Math.max(1, Math.min(3, cellW * stride * 0.3)) };
}
