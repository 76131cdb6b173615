import { describe, expect, it } from 'vitest';
import { canonicalJSON } from './canonical-json';

describe('canonicalJSON', () => {
  it('gives the same text for the same recipe whatever the key order', () => {
    expect(canonicalJSON({ b: 1, a: { d: [1, { z: 1, y: 2 }], c: 2 } })).toBe(canonicalJSON({ a: { c: 2, d: [1, { y: 2, z: 1 }] }, b: 1 }));
    expect(canonicalJSON({ a: 1, b: undefined })).toBe('{"a":1}');
  });
});
