// CG envelope test. Envelope corners come from the aircraft's flight manual as (arm, weight)
// pairs; a loading exactly on a limit line is within limits, so a point on an edge counts as
// inside. Floating-point division can put a computed CG a hair off a line it sits on exactly,
// hence the small edge tolerance.

export type EnvelopePoint = [arm: number, weight: number];

const RELATIVE_TOLERANCE = 1e-9;

function checkFinite(value: number, what: string): void {
  if (!Number.isFinite(value)) throw new RangeError(`${what} must be a finite number, got ${value}`);
}

/** The polygon's corners without a repeated closing corner; at least three are needed. */
export function normalizeEnvelope(envelope: readonly EnvelopePoint[]): EnvelopePoint[] {
  const points = envelope.map(([arm, weight]): EnvelopePoint => {
    checkFinite(arm, "Envelope arm");
    checkFinite(weight, "Envelope weight");
    return [arm, weight];
  });
  const first = points[0];
  const last = points[points.length - 1];
  if (points.length > 1 && first && last && first[0] === last[0] && first[1] === last[1]) points.pop();
  if (points.length < 3) throw new RangeError("A CG envelope needs at least three corners");
  return points;
}

function distanceToSegment(px: number, py: number, a: EnvelopePoint, b: EnvelopePoint): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const lengthSquared = dx * dx + dy * dy;
  const t = lengthSquared === 0 ? 0 : Math.max(0, Math.min(1, ((px - a[0]) * dx + (py - a[1]) * dy) / lengthSquared));
  return Math.hypot(px - (a[0] + t * dx), py - (a[1] + t * dy));
}

/** Whether (arm, weight) lies inside the envelope polygon or on its boundary. */
export function isWithinEnvelope(arm: number, weight: number, envelope: readonly EnvelopePoint[]): boolean {
  checkFinite(arm, "Arm");
  checkFinite(weight, "Weight");
  const polygon = normalizeEnvelope(envelope);
  let scale = Math.max(1, Math.abs(arm), Math.abs(weight));
  for (const [x, y] of polygon) scale = Math.max(scale, Math.abs(x), Math.abs(y));
  const tolerance = RELATIVE_TOLERANCE * scale;

  let inside = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const a = polygon[j] as EnvelopePoint;
    const b = polygon[i] as EnvelopePoint;
    if (distanceToSegment(arm, weight, a, b) <= tolerance) return true;
    // Even-odd ray cast toward +arm; edges are half-open in weight so a vertex is counted once.
    if (a[1] > weight !== b[1] > weight) {
      const crossingArm = a[0] + ((weight - a[1]) * (b[0] - a[0])) / (b[1] - a[1]);
      if (arm < crossingArm) inside = !inside;
    }
  }
  return inside;
}
