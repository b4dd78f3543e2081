import type { SlabDetail } from '../../../../shared/slabs';
import { LIVE_EDGE_LABELS } from '../../../../shared/slabs';
import { describeDefect } from '../../../../shared/slab-input';
import { useMeasures } from '../../../lib/units';

export function MeasurementsTable({ slab }: { slab: SlabDetail }) {
  const m = useMeasures();
  const rows: [string, string][] = [
    ['Thickness', m.length(slab.thicknessIn)],
    ['Width, measured along the slab', slab.widthsIn.map((w) => m.length(w)).join(' · ')],
    ['Average width', m.length(slab.widthIn)],
    ['Length', m.longLength(slab.lengthIn)],
    ['Board feet', `${m.boardFeet(slab.boardFeet)} (thickness × average width × length ÷ 144, in inches)`],
    ['Edges', LIVE_EDGE_LABELS[slab.liveEdge]],
    ['Figure', slab.figures.length ? `${slab.figures.join(', ')}${slab.figureNotes ? ` — ${slab.figureNotes}` : ''}` : slab.figureNotes || 'Plain'],
    ['Defects', slab.defects.length ? slab.defects.map((d) => describeDefect(d, m.length)).join('; ') : 'None noted'],
    ['In the yard', [slab.yardStack, slab.yardPosition].filter(Boolean).join(', ') || '—'],
  ];
  return (
    <table className="w-full text-left">
      <tbody>
        {rows.map(([k, v]) => (
          <tr key={k} className="border-b border-line align-top">
            <th scope="row" className="w-2/5 py-1.5 pr-3 font-semibold">{k}</th>
            <td className="py-1.5">{v}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
