/**
 * ISO metric thread data the part model needs: pitch from the designation, the basic minor diameters, and the
 * default tap-drill depth. (The `thread` calculator gives the full table for people; this is the geometry.)
 *
 * - Coarse pitches: ISO 261:1998 general-purpose series (from memory), M1–M64.
 * - Basic profile, ISO 68-1: H = (√3/2)·P; internal minor D1 = D − 1.082532·P; external minor (root)
 *   d3 = d − 1.226869·P (ISO 724 tabulates D1 and d3).
 * - The modelled tap-drill hole is D1 (what the solid kernel cuts), drilled three pitches beyond the full
 *   thread when the template gives no drill depth (room for a plug tap's lead; common practice).
 */
export const ISO_261_COARSE_PITCH_MM: Readonly<Record<number, number>> = {
  1: 0.25, 1.2: 0.25, 1.4: 0.3, 1.6: 0.35, 1.8: 0.35, 2: 0.4, 2.5: 0.45, 3: 0.5, 3.5: 0.6, 4: 0.7, 5: 0.8,
  6: 1, 7: 1, 8: 1.25, 10: 1.5, 12: 1.75, 14: 2, 16: 2, 18: 2.5, 20: 2.5, 22: 2.5, 24: 3, 27: 3, 30: 3.5,
  33: 3.5, 36: 4, 39: 4, 42: 4.5, 45: 4.5, 48: 5, 52: 5, 56: 5.5, 60: 5.5, 64: 6,
};

export interface MetricThreadGeometry {
  designation: string;
  nominalDiameterMm: number;
  pitchMm: number;
  coarse: boolean;
  /** D1, the basic minor diameter of the nut thread: the modelled bore. */
  internalMinorDiameterMm: number;
  /** d3, the root diameter of the bolt thread. */
  externalMinorDiameterMm: number;
}

/** Pitches beyond three pitches of run-out (common practice). */
export const TAP_RUN_OUT_PITCHES = 3;

/** Parses "M6" (coarse, ISO 261) or "M6x0.75" / "M6×0.75" (fine); undefined for anything else. */
export function metricThread(designation: string): MetricThreadGeometry | undefined {
  const m = /^\s*M\s*(\d+(?:\.\d+)?)\s*(?:[x×]\s*(\d+(?:\.\d+)?))?\s*$/i.exec(designation);
  if (!m) return undefined;
  const d = Number(m[1]);
  let pitch: number | undefined;
  let coarse = true;
  if (m[2] !== undefined) {
    pitch = Number(m[2]);
    coarse = false;
    if (!(pitch > 0) || pitch >= d / 2) return undefined;
  } else pitch = ISO_261_COARSE_PITCH_MM[d];
  if (pitch === undefined) return undefined;
  return {
    designation: coarse ? `M${d}` : `M${d}x${pitch}`,
    nominalDiameterMm: d,
    pitchMm: pitch,
    coarse,
    internalMinorDiameterMm: d - 1.0825317547 * pitch,
    externalMinorDiameterMm: d - 1.226869322 * pitch,
  };
}
