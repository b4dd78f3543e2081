import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { MoistureReadingView } from '../../../../shared/slabs';

type Props = { readings: MoistureReadingView[]; targetMcPercent: number };

/** The drying curve: % MC over time with the mill's target. Loaded on demand (chart library is large). */
export default function MoistureChart({ readings, targetMcPercent }: Props) {
  const data = readings.map((r) => ({ day: r.measuredOn, mc: r.mcPercent, time: Date.parse(r.measuredOn) }));
  return (
    <div className="h-56 w-full" role="img" aria-label={`Moisture content readings from ${data[0]?.day ?? ''} to ${data.at(-1)?.day ?? ''}, latest ${data.at(-1)?.mc ?? ''} percent; target ${targetMcPercent} percent`}>
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 8, right: 12, bottom: 4, left: -12 }}>
          <CartesianGrid stroke="#d9ccb4" strokeDasharray="3 3" />
          <XAxis dataKey="time" type="number" scale="time" domain={['dataMin', 'dataMax']}
            tickFormatter={(t: number) => new Date(t).toISOString().slice(0, 7)} tick={{ fontSize: 12 }} />
          <YAxis unit="%" tick={{ fontSize: 12 }} domain={[0, 'auto']} />
          <Tooltip labelFormatter={(t) => new Date(Number(t)).toISOString().slice(0, 10)} formatter={(v) => [`${v} %`, 'Moisture content']} />
          <ReferenceLine y={targetMcPercent} stroke="#3d4a2c" strokeDasharray="6 3" label={{ value: `target ${targetMcPercent} %`, fontSize: 12, fill: '#3d4a2c', position: 'insideTopRight' }} />
          <Line type="monotone" dataKey="mc" stroke="#6b3416" strokeWidth={2} dot={{ r: 3 }} isAnimationActive={false} />
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
