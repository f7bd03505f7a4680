// A booking's loading: the aircraft's weight and balance profile plus what the member puts in
// the seats, the baggage and the tanks → weight, moment and CG at takeoff and at landing (after
// the planned burn), checked against the envelope, the maximum weights, each station's limit
// and each tank's usable capacity. Fuel volumes become weights at the standard density
// (FAA-H-8083-25: avgas 6 lb/US gal); units follow the profile (lb/in/US gal or kg/mm/L).

import { fuelWeight, takeoffAndLandingWeightAndBalance, type EnvelopePoint, type WbResult } from "@/lib/performance";

export type LoadingProfile = {
  unitSystem: "imperial" | "metric";
  emptyWeight: number;
  emptyArm: number;
  maxTakeoffWeight: number;
  maxLandingWeight: number | null;
  stations: { key: string; name: string; arm: number; maxWeight: number | null }[];
  tanks: { key: string; name: string; arm: number; usableCapacity: number }[];
  fuelKind: "avgas" | "jet";
  envelopeNormal: EnvelopePoint[];
  envelopeUtility: EnvelopePoint[] | null;
};

export type LoadingInput = {
  category: "normal" | "utility";
  stationWeights: Record<string, number>;
  fuelVolumes: Record<string, number>;
  burnVolume: number;
};

export type LoadingResult = {
  takeoff: WbResult;
  landing: WbResult;
  envelope: EnvelopePoint[];
  fuelWeight: number;
  burnWeight: number;
  /** Everything that is out of limits, in plain words; empty when the loading is within them all. */
  problems: string[];
};

export function unitsOf(unitSystem: "imperial" | "metric") {
  return unitSystem === "metric" ? { weight: "kg", arm: "mm", fuel: "L" } : { weight: "lb", arm: "in", fuel: "US gal" };
}

function weightOfFuel(profile: LoadingProfile, volume: number): number {
  const w = fuelWeight(volume, profile.unitSystem === "metric" ? "litre" : "usgal", profile.fuelKind);
  return profile.unitSystem === "metric" ? w.kg : w.lb;
}

/** The figures of a problem, to one decimal, written as the club's locale writes numbers. */
function numberWriter(locale: string) {
  const nf = new Intl.NumberFormat(locale, { maximumFractionDigits: 1 });
  return (n: number) => nf.format(Math.round(n * 10) / 10);
}

/** Weights, arms and fuel at takeoff and landing against the aircraft's limits; problems in words, figures in `locale`. */
export function computeLoading(profile: LoadingProfile, input: LoadingInput, locale = "en-US"): LoadingResult {
  const fmt = numberWriter(locale);
  const u = unitsOf(profile.unitSystem);
  const problems: string[] = [];
  const envelope = input.category === "utility" && profile.envelopeUtility ? profile.envelopeUtility : profile.envelopeNormal;
  if (input.category === "utility" && !profile.envelopeUtility) problems.push("This aircraft has no utility-category envelope; the normal one is used.");

  const loads = profile.stations.map((s) => {
    const weight = input.stationWeights[s.key] ?? 0;
    if (weight < 0) problems.push(`${s.name}: the weight cannot be negative.`);
    if (s.maxWeight !== null && weight > s.maxWeight) problems.push(`${s.name}: ${fmt(weight)} ${u.weight} is over its limit of ${fmt(s.maxWeight)} ${u.weight}.`);
    return { weight, arm: s.arm };
  });

  const totalFuel = profile.tanks.reduce((sum, t) => sum + (input.fuelVolumes[t.key] ?? 0), 0);
  if (input.burnVolume < 0) problems.push("The planned burn cannot be negative.");
  if (input.burnVolume > totalFuel + 1e-9) problems.push(`The planned burn of ${fmt(input.burnVolume)} ${u.fuel} is more than the ${fmt(totalFuel)} ${u.fuel} aboard.`);
  const burnShare = totalFuel > 0 ? Math.min(Math.max(input.burnVolume, 0), totalFuel) / totalFuel : 0;

  const fuelLoads: { weight: number; arm: number }[] = [];
  const burns: { weight: number; arm: number }[] = [];
  for (const t of profile.tanks) {
    const volume = input.fuelVolumes[t.key] ?? 0;
    if (volume < 0) problems.push(`${t.name}: the fuel cannot be negative.`);
    if (volume > t.usableCapacity + 1e-9) problems.push(`${t.name}: ${fmt(volume)} ${u.fuel} is more than its usable ${fmt(t.usableCapacity)} ${u.fuel}.`);
    const weight = weightOfFuel(profile, Math.max(volume, 0));
    fuelLoads.push({ weight, arm: t.arm });
    // The burn is taken from the tanks in proportion to what each holds (both tanks feeding).
    burns.push({ weight: weight * burnShare, arm: t.arm });
  }

  const { takeoff, landing } = takeoffAndLandingWeightAndBalance(
    { emptyWeight: profile.emptyWeight, emptyArm: profile.emptyArm, maxTakeoffWeight: profile.maxTakeoffWeight, maxLandingWeight: profile.maxLandingWeight ?? undefined, envelope },
    [...loads.map((l) => ({ weight: Math.max(l.weight, 0), arm: l.arm })), ...fuelLoads],
    burns,
  );
  const maxLanding = profile.maxLandingWeight ?? profile.maxTakeoffWeight;
  if (takeoff.overweight) problems.push(`Takeoff weight ${fmt(takeoff.weight)} ${u.weight} is over the maximum of ${fmt(profile.maxTakeoffWeight)} ${u.weight}.`);
  if (!takeoff.withinEnvelope) problems.push(`At takeoff the CG (${fmt(takeoff.cg)} ${u.arm} at ${fmt(takeoff.weight)} ${u.weight}) is outside the ${input.category} envelope.`);
  if (landing.overweight) problems.push(`Landing weight ${fmt(landing.weight)} ${u.weight} is over the maximum of ${fmt(maxLanding)} ${u.weight}.`);
  if (!landing.withinEnvelope) problems.push(`At landing the CG (${fmt(landing.cg)} ${u.arm} at ${fmt(landing.weight)} ${u.weight}) is outside the ${input.category} envelope.`);

  const fuelTotalWeight = fuelLoads.reduce((s, l) => s + l.weight, 0);
  return { takeoff, landing, envelope, fuelWeight: fuelTotalWeight, burnWeight: burns.reduce((s, b) => s + b.weight, 0), problems };
}
