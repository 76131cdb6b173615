import { describe, expect, it } from 'vitest';
import { degreeTicks, latitudeLabel, longitudeLabel } from './degree-label';

describe('degree labels', () => {
  it('writes latitudes with N/S and longitudes with E/W in any turn (common practice)', () => {
    expect([latitudeLabel(20), latitudeLabel(-5), latitudeLabel(0)]).toEqual(['20°N', '5°S', '0°']);
    expect([longitudeLabel(150), longitudeLabel(210), longitudeLabel(-120), longitudeLabel(180), longitudeLabel(0)]).toEqual(['150°E', '150°W', '120°W', '180°', '0°']);
  });

  it('chooses round ticks that stay few', () => {
    expect(degreeTicks(-180, 180)).toEqual([-180, -120, -60, 0, 60, 120, 180]);
    expect(degreeTicks(120, 240)).toEqual([120, 140, 160, 180, 200, 220, 240]);
    expect(degreeTicks(-30, 30, 3)).toEqual([-30, 0, 30]);
  });
});
