/** Mean Earth radius in metres (IUGG mean radius R1 = 6 371 008.8 m). */
export const earthMeanRadiusM = 6_371_008.8;

export interface LatLng {
  latitude: number;
  longitude: number;
}

const radians = (degrees: number) => (degrees * Math.PI) / 180;

/**
 * Great-circle distance in metres between two positions in decimal degrees, by the haversine
 * formula on a sphere of the mean Earth radius (off by up to about 0.5 % from the ellipsoid,
 * which is far below what a phone's fix can tell apart).
 */
export function greatCircleDistanceM(a: LatLng, b: LatLng): number {
  const dLat = radians(b.latitude - a.latitude);
  const dLng = radians(b.longitude - a.longitude);
  const h =
    Math.sin(dLat / 2) ** 2 +
    Math.cos(radians(a.latitude)) * Math.cos(radians(b.latitude)) * Math.sin(dLng / 2) ** 2;
  return 2 * earthMeanRadiusM * Math.asin(Math.min(1, Math.sqrt(h)));
}
