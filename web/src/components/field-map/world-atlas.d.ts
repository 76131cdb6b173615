// Minimal types for the two packages the map draws coastlines with (neither ships its own).
declare module 'world-atlas/land-110m.json' {
  const topology: { type: 'Topology'; objects: { land: unknown } };
  export default topology;
}
declare module 'topojson-client' {
  type Position = [number, number];
  type Geometry = { type: 'Polygon'; coordinates: Position[][] } | { type: 'MultiPolygon'; coordinates: Position[][][] };
  export function feature(topology: unknown, object: unknown): { type: 'FeatureCollection'; features: { geometry: Geometry }[] } | { type: 'Feature'; geometry: Geometry };
}
