import { Notice } from '../../../components/ui/notice';
import type { LoadingAdvice } from '../../../../shared/loading';
import { useMeasures } from '../../../lib/units';

/** What to bring to the yard, and the lifting caution, for a set of slabs. */
export function LoadingAdvicePanel({ advice, loadingHelp }: { advice: LoadingAdvice; loadingHelp: boolean }) {
  const m = useMeasures();
  return (
    <section aria-labelledby="bring-heading" className="flex flex-col gap-2 rounded-md border border-line bg-surface-raised p-4">
      <h2 id="bring-heading" className="text-lg font-bold">What to bring</h2>
      <p>
        {advice.slabCount} {advice.slabCount === 1 ? 'slab' : 'slabs'}, about <strong>{m.weight(advice.totalWeightLb)}</strong> in all;
        the longest is {m.longLength(advice.longestSlabIn)} and the heaviest about {m.weight(advice.heaviestSlabLb)}.
      </p>
      <p>{advice.vehicle}</p>
      <ul className="list-disc pl-6">
        {advice.bring.map((b) => <li key={b}>{b}</li>)}
      </ul>
      {loadingHelp
        ? <p>The yard crew will help you load{advice.needsEquipment ? ' with the slab cart or forklift, run by trained operators only; please stand clear of a raised load' : ''}.</p>
        : advice.millHelpRecommended && <Notice tone="caution">We recommend asking for the mill's loading help for this order.</Notice>}
      <Notice tone="caution" title="Lifting and loading">
        <p>{advice.liftingMessage}</p>
        <p className="mt-1">{advice.caution}</p>
      </Notice>
    </section>
  );
}
