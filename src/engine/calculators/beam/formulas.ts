/**
 * Elastic beam formulas for a prismatic beam with a single point load (small deflections, bending only).
 *
 *  - second moment of area: round I = π·d⁴/64, rectangular I = b·h³/12 (h in the load direction)
 *  - extreme-fibre distance c: d/2 or h/2
 *  - cantilever, load F at the free end:             M_max = F·L (at the fixed end),  δ = F·L³/(3·E·I)
 *  - simply supported, load F at mid-span:           M_max = F·L/4 (under the load),   δ = F·L³/(48·E·I)
 *  - bending stress σ = M·c/I
 *
 * Sources: Roark's Formulas for Stress and Strain, Table 8.1 (cases: cantilever with end load; simply
 * supported with centre load) — from memory; any mechanics of materials text (flexure formula σ = M·c/I,
 * second moments of area of a circle and a rectangle).
 * Units: N, mm, MPa (= N/mm²), so δ comes out in mm and σ in MPa.
 */

export type BeamCase = "cantilever" | "simply-supported";

export type BeamSection = { kind: "round"; diameterMm: number } | { kind: "rectangular"; widthMm: number; heightMm: number };

/** I about the neutral axis perpendicular to the load (mm⁴). */
export function secondMomentMm4(section: BeamSection): number {
  return section.kind === "round" ? (Math.PI * section.diameterMm ** 4) / 64 : (section.widthMm * section.heightMm ** 3) / 12;
}

/** Distance from the neutral axis to the extreme fibre (mm). */
export function extremeFibreMm(section: BeamSection): number {
  return section.kind === "round" ? section.diameterMm / 2 : section.heightMm / 2;
}

/** Depth of the section in the load direction (mm). */
export function sectionDepthMm(section: BeamSection): number {
  return section.kind === "round" ? section.diameterMm : section.heightMm;
}

/** Largest bending moment: F·L for a cantilever, F·L/4 for a centre-loaded simple span (N·mm). */
export function maxMomentNmm(beamCase: BeamCase, loadN: number, lengthMm: number): number {
  return beamCase === "cantilever" ? loadN * lengthMm : (loadN * lengthMm) / 4;
}

/** Deflection under the load: F·L³/(3EI) or F·L³/(48EI) (mm). */
export function deflectionMm(beamCase: BeamCase, loadN: number, lengthMm: number, modulusMpa: number, iMm4: number): number {
  const k = beamCase === "cantilever" ? 3 : 48;
  return (loadN * lengthMm ** 3) / (k * modulusMpa * iMm4);
}

/** Flexure formula σ = M·c/I (MPa). */
export function bendingStressMpa(momentNmm: number, cMm: number, iMm4: number): number {
  return (momentNmm * cMm) / iMm4;
}
