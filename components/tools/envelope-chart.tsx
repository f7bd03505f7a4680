"use client";
import { CartesianGrid, Legend, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";

// The CG envelope as the flight manual draws it (arm across, weight up), with the takeoff point
// (circle) and the landing point after the planned burn (triangle). Shapes and words tell the
// points apart, never colour alone; the figure's table says the same for screen readers.

type Point = { arm: number; weight: number };

export function EnvelopeChart({ envelope, utility, takeoff, landing, units }: { envelope: [number, number][]; utility?: [number, number][] | null; takeoff: Point; landing: Point; units: { weight: string; arm: string } }) {
  const closed = (pts: [number, number][]) => [...pts, pts[0]!].map(([arm, weight]) => ({ arm, weight }));
  const all = [...envelope, ...(utility ?? [])];
  const arms = [...all.map((p) => p[0]), takeoff.arm, landing.arm];
  const weights = [...all.map((p) => p[1]), takeoff.weight, landing.weight];
  const pad = (lo: number, hi: number) => (hi - lo) * 0.08 || 1;
  // Round the axes out to whole steps so that the ticks read like the flight manual's grid.
  const step = (span: number) => { const raw = span / 5; const p = 10 ** Math.floor(Math.log10(raw || 1)); return [1, 2, 5, 10].map((m) => m * p).find((s) => s >= raw) ?? raw; };
  const around = (lo: number, hi: number): [number, number] => { const s = step(hi - lo + pad(lo, hi)); return [Math.floor((lo - pad(lo, hi)) / s) * s, Math.ceil((hi + pad(lo, hi)) / s) * s]; };
  const xDomain = around(Math.min(...arms), Math.max(...arms));
  const yDomain = around(Math.min(...weights), Math.max(...weights));
  const fmt = (n: number) => (Math.round(n * 10) / 10).toLocaleString("en-US");
  return (
    <figure aria-label="CG envelope chart" className="min-w-0">
      <div className="h-72 w-full sm:h-80" data-testid="envelope-chart">
        <ResponsiveContainer width="100%" height="100%">
          <ScatterChart margin={{ top: 10, right: 12, bottom: 24, left: 4 }}>
            <CartesianGrid stroke="#d9d4c5" />
            <XAxis type="number" dataKey="arm" name="CG" unit={` ${units.arm}`} domain={xDomain} tickFormatter={fmt} tick={{ fontSize: 12 }} />
            <YAxis type="number" dataKey="weight" name="Weight" domain={yDomain} tickFormatter={fmt} tick={{ fontSize: 12 }} width={52} />
            <Tooltip formatter={(v) => fmt(Number(v))} />
            <Legend verticalAlign="bottom" height={24} />
            <Scatter name="Normal envelope" data={closed(envelope)} line={{ stroke: "#1f4e5f", strokeWidth: 2 }} shape={() => <g />} fill="#1f4e5f" isAnimationActive={false} legendType="line" />
            {utility ? <Scatter name="Utility envelope" data={closed(utility)} line={{ stroke: "#5a4fa3", strokeWidth: 2, strokeDasharray: "6 4" }} shape={() => <g />} fill="#5a4fa3" isAnimationActive={false} legendType="plainline" /> : null}
            <Scatter name="Takeoff" data={[takeoff]} shape="circle" fill="#d9731f" isAnimationActive={false} legendType="circle" />
            <Scatter name="Landing" data={[landing]} shape="triangle" fill="#b3312f" isAnimationActive={false} legendType="triangle" />
          </ScatterChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-2 text-sm">
        <table className="w-full text-left tabular">
          <caption className="sr-only">Points drawn on the envelope</caption>
          <thead><tr><th scope="col">Point</th><th scope="col">Weight ({units.weight})</th><th scope="col">CG ({units.arm})</th></tr></thead>
          <tbody>
            <tr><th scope="row">● Takeoff</th><td>{fmt(takeoff.weight)}</td><td>{fmt(takeoff.arm)}</td></tr>
            <tr><th scope="row">▲ Landing</th><td>{fmt(landing.weight)}</td><td>{fmt(landing.arm)}</td></tr>
          </tbody>
        </table>
      </figcaption>
    </figure>
  );
}
