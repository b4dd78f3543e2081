import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { ReadingView } from '../../../../shared/readings';

type Props = { readings: ReadingView[]; targetMcPercent: number; airDryReadyOn: string | null };

// The theme's moss, caution and accent; SVG attributes take plain colours more reliably than CSS variables.
const MOSS = '#3d4a2c';
const CAUTION = '#8a5a00';
const ACCENT = '#6b3416';

const day = (t: number) => new Date(t).toISOString().slice(0, 10);

/**
 * The yard's drying curve: every reading's MC over time, the mill's target as a level line and the
 * estimated air-dry date (a year per inch, common practice) as an upright line, so staff see how
 * far each slab has to go.
 */
export function DryingCurve({ readings, targetMcPercent, airDryReadyOn }: Props) {
  const data = readings.map((r) => ({ t: Date.parse(`${r.measuredOn}T00:00:00Z`), mc: r.mcPercent }));
  const readyT = airDryReadyOn ? Date.parse(`${airDryReadyOn}T00:00:00Z`) : null;
  const times = [...data.map((d) => d.t), ...(readyT === null ? [] : [readyT])];
  const [from, to] = [Math.min(...times), Math.max(...times)];
  // Evenly spaced month ticks: recharts' own choice on a time axis can leave a single label.
  const ticks = from === to ? [from] : [0, 1, 2, 3].map((i) => from + ((to - from) * i) / 3);
  const latest = readings.at(-1);
  const summary = latest
    ? `Drying curve: ${readings.length} readings, latest ${latest.mcPercent} % on ${latest.measuredOn}; target ${targetMcPercent} %${airDryReadyOn ? `; estimated air-dry by ${airDryReadyOn}` : ''}.`
    : 'No readings yet.';
  if (!data.length) return <p className="text-ink-soft">{summary}</p>;
  return (
    <figure className="flex flex-col gap-1">
      <div className="h-64 w-full" role="img" aria-label={summary}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 12, right: 20, bottom: 4, left: -8 }}>
            <CartesianGrid strokeDasharray="2 4" className="stroke-line" />
            <XAxis dataKey="t" type="number" scale="time" domain={[from, to]} ticks={ticks}
              tickFormatter={(t: number) => day(t).slice(0, 7)} tick={{ fontSize: 12 }} />
            <YAxis unit="%" domain={[0, (max: number) => Math.ceil((Math.max(max, targetMcPercent) + 2) / 10) * 10]} tick={{ fontSize: 12 }} allowDecimals={false} />
            <Tooltip labelFormatter={(t) => day(Number(t))} formatter={(v) => [`${v} %`, 'MC']} />
            <ReferenceLine y={targetMcPercent} stroke={MOSS} strokeDasharray="8 4"
              label={{ value: `target ${targetMcPercent} %`, position: 'insideBottomRight', fontSize: 12, fill: MOSS }} />
            {readyT !== null && (
              <ReferenceLine x={readyT} stroke={CAUTION} strokeDasharray="3 3"
                label={{ value: `air-dry est. ${airDryReadyOn}`, position: 'insideTopRight', fontSize: 12, fill: CAUTION }} />
            )}
            <Line type="linear" dataKey="mc" stroke={ACCENT} strokeWidth={2} dot={{ r: 3 }} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-sm text-ink-soft">{summary} The air-dry date is a rule of thumb; the meter decides.</figcaption>
    </figure>
  );
}
