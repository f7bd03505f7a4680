// The caution that goes with a density altitude figure. High density altitude means longer
// takeoff runs and weaker climbs (FAA-P-8740-2, Density Altitude); the thresholds below are our
// own, to grade the wording, never to say that performance is adequate.

export type DensityCaution = { level: "normal" | "raised" | "high"; text: string };

export function densityAltitudeCaution(densityAltitudeFt: number, fieldElevationFt: number): DensityCaution {
  const above = densityAltitudeFt - fieldElevationFt;
  const base = "Work out takeoff distance and climb from the aircraft's flight manual for these conditions; this figure does not replace them.";
  if (densityAltitudeFt >= 5000 || above >= 2000) {
    return { level: "high", text: `High density altitude: expect a much longer takeoff roll and a much weaker climb than at sea level. ${base}` };
  }
  if (above >= 1000 || densityAltitudeFt >= 3000) {
    return { level: "raised", text: `The aircraft will perform as if ${Math.round(above).toLocaleString("en-US")} ft above the field: a longer takeoff roll and a weaker climb. ${base}` };
  }
  return { level: "normal", text: `Density altitude is near the field elevation; performance still falls off with weight, slope, grass and wind. ${base}` };
}
