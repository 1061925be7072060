import { describe, expect, it } from 'vitest';
import {
  imageTransform,
  pixelOfSite,
  scaleFromTwoPoints,
  siteOfPixel,
} from '../../../../src/ledger/map/drawing-frame.ts';

const frame = { metresPerPixel: 0.5, originPx: { x: 100, y: 200 }, northDeg: 0 };

describe('the drawing on the site grid', () => {
  it('north up: a pixel right of and above the origin is east and north of it, at the scale', () => {
    // pixel (140, 160): 40 px right, 40 px up → (20 m east, 20 m north) at 0.5 m/px — worked by hand
    expect(siteOfPixel(frame, { x: 140, y: 160 })).toEqual({ x: 20, y: 20 });
  });

  it('north 90° clockwise on the drawing: right on the drawing is north', () => {
    const p = siteOfPixel({ ...frame, northDeg: 90 }, { x: 110, y: 200 }); // 10 px right = 5 m along the drawing's right = north
    expect(p.x).toBeCloseTo(0, 12);
    expect(p.y).toBeCloseTo(5, 12);
  });

  it('pixelOfSite undoes siteOfPixel at any north', () => {
    for (const northDeg of [0, 30, -135, 270]) {
      const f = { ...frame, northDeg };
      const back = pixelOfSite(f, siteOfPixel(f, { x: 333, y: 44 }));
      expect(back.x).toBeCloseTo(333, 9);
      expect(back.y).toBeCloseTo(44, 9);
    }
  });

  it('the SVG matrix maps a pixel to (x, −y) as siteOfPixel does', () => {
    const f = { ...frame, northDeg: 30 };
    const [a, b, c, d, e, g] = /matrix\(([^)]*)\)/.exec(imageTransform(f))![1]!.split(' ').map(Number) as number[];
    const px = { x: 250, y: 75 };
    const site = siteOfPixel(f, px);
    expect(a! * px.x + c! * px.y + e!).toBeCloseTo(site.x, 9);
    expect(b! * px.x + d! * px.y + g!).toBeCloseTo(-site.y, 9);
  });

  it('scale from two points 200 px apart and 80 m typed: 0.4 m per pixel; nothing for 0 px or a bad distance', () => {
    expect(scaleFromTwoPoints({ x: 0, y: 0 }, { x: 120, y: 160 }, 80)).toBe(0.4); // √(120² + 160²) = 200 px — worked by hand
    expect(scaleFromTwoPoints({ x: 5, y: 5 }, { x: 5, y: 5 }, 80)).toBeUndefined();
    expect(scaleFromTwoPoints({ x: 0, y: 0 }, { x: 1, y: 0 }, NaN)).toBeUndefined();
  });
});
