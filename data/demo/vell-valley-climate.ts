// Invented monthly climate for the demo's fictional Vell Valley mountain hut (northern mid-latitudes,
// snowy winters). Made up for the demo; not measured anywhere.
export const VELL_HUT_SITE = {
  latitudeDeg: 46.4,
  longitudeDeg: 9.8,
  tiltDeg: 55,
  azimuthDeg: 180,
  albedo: 0.2,
  months: [
    { ghiKWhM2Day: 1.45, clearnessIndex: 0.52, tMaxC: -2, tMinC: -10, albedo: 0.7 },
    { ghiKWhM2Day: 2.4, clearnessIndex: 0.55, tMaxC: -1, tMinC: -9, albedo: 0.7 },
    { ghiKWhM2Day: 3.6, clearnessIndex: 0.54, tMaxC: 2, tMinC: -6, albedo: 0.6 },
    { ghiKWhM2Day: 4.6, clearnessIndex: 0.5, tMaxC: 6, tMinC: -2, albedo: 0.4 },
    { ghiKWhM2Day: 5.3, clearnessIndex: 0.48, tMaxC: 11, tMinC: 2, albedo: 0.2 },
    { ghiKWhM2Day: 5.9, clearnessIndex: 0.5, tMaxC: 15, tMinC: 5, albedo: 0.2 },
    { ghiKWhM2Day: 6.0, clearnessIndex: 0.52, tMaxC: 18, tMinC: 7, albedo: 0.2 },
    { ghiKWhM2Day: 5.1, clearnessIndex: 0.52, tMaxC: 17, tMinC: 7, albedo: 0.2 },
    { ghiKWhM2Day: 3.9, clearnessIndex: 0.53, tMaxC: 13, tMinC: 4, albedo: 0.2 },
    { ghiKWhM2Day: 2.6, clearnessIndex: 0.53, tMaxC: 8, tMinC: 0, albedo: 0.3 },
    { ghiKWhM2Day: 1.6, clearnessIndex: 0.5, tMaxC: 2, tMinC: -5, albedo: 0.5 },
    { ghiKWhM2Day: 1.2, clearnessIndex: 0.5, tMaxC: -1, tMinC: -8, albedo: 0.7 },
  ],
};
