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
  // Fuel above a tank's capacity is not a finding: it is a misread, refused by fuelAboveCapacity.
  return { outcome: findings.length ? "findings" : "ok", findings };
}

/**
 * Readings no tank can hold, each named: `{ index, message }` for every tank whose quantity is
 * above its usable capacity (a tank can hold no more than it holds; the reading is wrong).
 */
export function fuelAboveCapacity(fuel: { tank: string; quantity: number; capacity: number | null }[], fuelUnit: string): { index: number; message: string }[] {
  const out: { index: number; message: string }[] = [];
  fuel.forEach((f, index) => {
    if (f.capacity !== null && f.quantity > f.capacity + 1e-9) {
      out.push({ index, message: `${f.tank} holds at most ${f.capacity} ${fuelUnit}; ${f.quantity} ${fuelUnit} cannot be in it. Check the reading.` });
    }
  });
  return out;
}

/** The squawk text of a finding: what the pilot wrote, or the item itself when they only tapped "Finding". */
export function findingDescription(item: { section: string; label: string; kind: "check" | "document" }, note: string | null): string {
  const what = item.kind === "document" ? `Not aboard: ${item.label}` : `${item.section} — ${item.label}`;
  return note ? `${what}: ${note}` : `${what}: not as expected (found during the preflight).`;
}

/**
 * One-tap oil readings for the preflight: from one step below the club's minimum to the
 * maximum (or two steps above the minimum when there is none), in whole quarts or half litres.
 */
export function oilChoices(minimum: number, maximum: number | null, unit: "qt" | "L"): number[] {
  const step = unit === "qt" ? 1 : 0.5;
  const first = Math.max(step, Math.floor(minimum / step) * step - step);
  const last = maximum !== null ? Math.ceil(maximum / step) * step : Math.ceil(minimum / step) * step + 2 * step;
  const out: number[] = [];
  for (let v = first; v <= last + 1e-9 && out.length < 12; v += step) out.push(Math.round(v * 10) / 10);
  return out;
}
