/** The part of d3-contour 4 the level map uses (the package ships no types). */
declare module 'd3-contour' {
  /** A GeoJSON MultiPolygon of grid coordinates, with the threshold it bounds. */
  export interface ContourMultiPolygon {
    type: 'MultiPolygon';
    value: number;
    coordinates: [number, number][][][];
  }
  export interface Contours {
    (values: ArrayLike<number>): ContourMultiPolygon[];
    size(size: [number, number]): Contours;
    thresholds(thresholds: number[]): Contours;
    smooth(smooth: boolean): Contours;
    contour(values: ArrayLike<number>, threshold: number): ContourMultiPolygon;
  }
  export function contours(): Contours;
}
