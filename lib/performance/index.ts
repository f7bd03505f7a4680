// Pilot tools: weight and balance, fuel and reserves, pressure and density altitude. These
// inform the pilot in command's own preflight decision; they never replace the flight manual.
export { isWithinEnvelope, normalizeEnvelope, type EnvelopePoint } from "./envelope";
export {
  takeoffAndLandingWeightAndBalance,
  weightAndBalance,
  type WbAircraft,
  type WbLoad,
  type WbResult,
} from "./weight-and-balance";
export {
  FEET_PER_METRE,
  HPA_PER_INHG,
  STANDARD_SETTING_INHG,
  densityAltitude,
  inHgFromHpa,
  isaTemperatureC,
  pressureAltitude,
} from "./atmosphere";
export {
  AVGAS_LB_PER_US_GAL,
  JET_FUEL_LB_PER_US_GAL,
  KG_PER_LB,
  LITRES_PER_US_GAL,
  OIL_LB_PER_US_GAL,
  fuelEndurance,
  fuelReserveMinutes,
  fuelWeight,
  fuelDensityNote,
  kgFromLb,
  lbFromKg,
  litresFromUsGallons,
  usGallonsFromLitres,
  type FluidKind,
  type VolumeUnit,
} from "./fuel";
