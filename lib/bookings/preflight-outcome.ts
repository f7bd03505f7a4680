// The preflight record's outcome: anything not right is a finding, said in plain words.
// Fuel samples: contaminants are heavier than fuel and settle in the sumps; a sample with water
// or sediment means drain again until clear (FAA-H-8083-25, Fuel Strainers, Sumps and Drains).

export type PreflightItemResult = { section: string; label: string; kind: "check" | "document"; result: "ok" | "finding"; note?: string | null };

export type PreflightInput = {
  items: PreflightItemResult[];
  sumps: { point: string; result: "clear" | "contaminated" }[];
  oilQuantity: number;
  oilMinimum: number;
  oilMaximum: number | null;
  oilUnit: string;
  fuel: { tank: string; quantity: number; capacity: number | null }[];
  fuelUnit: string;
};

export type PreflightOutcome = { outcome: "ok" | "findings"; findings: string[] };

export function evaluatePreflight(input: PreflightInput): PreflightOutcome {
  const findings: string[] = [];
  for (const item of input.items) {
    if (item.result !== "finding") continue;
    const what = item.kind === "document" ? `Not aboard: ${item.label}` : `${item.section} — ${item.label}`;
    findings.push(item.note ? `${what}: ${item.note}` : what);
  }
  for (const s of input.sumps) {
    if (s.result === "contaminated") findings.push(`Water or sediment in the fuel sample from ${s.point}: keep draining until the sample is clear; if it does not clear, do not fly.`);
  }
  if (input.oilQuantity < input.oilMinimum) {
    findings.push(`Oil ${input.oilQuantity} ${input.oilUnit} is below the club's minimum of ${input.oilMinimum} ${input.oilUnit} for this aircraft.`);
  } else if (input.oilMaximum !== null && input.oilQuantity > input.oilMaximum) {
    findings.push(`Oil ${input.oilQuantity} ${input.oilUnit} is above the maximum of ${input.oilMaximum} ${input.oilUnit}.`);
  }
  for (const f of input.fuel) {
    if (f.capacity !== null && f.quantity > f.capacity + 1e-9) findings.push(`${f.tank}: ${f.quantity} ${input.fuelUnit} is more than the tank's usable ${f.capacity} ${input.fuelUnit}; check the reading.`);
  }
  return { outcome: findings.length ? "findings" : "ok", findings };
}
