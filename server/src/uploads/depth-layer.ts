/** A depth layer as the library shows it: "0–100 m", or "1000 m – sea floor"; empty when not given. */
export function formatDepthLayer(layer: { topM: number; bottomM: number | null } | null): string {
  if (!layer) return '';
  return layer.bottomM === null ? `${layer.topM} m – sea floor` : `${layer.topM}–${layer.bottomM} m`;
}
