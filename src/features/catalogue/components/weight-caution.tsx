import { Notice } from '../../../components/ui/notice';
import type { SlabDetail } from '../../../../shared/slabs';
import { formatPercent } from '../../../../shared/wood/index';
import { useMeasures } from '../../../lib/units';

const TIER_TITLE = { 'one-person': 'One person can lift it', 'two-person': 'Two-person lift', equipment: 'Cart, forklift or hoist only' } as const;

/** Weight now and the lifting advice; figures come from the shared wood math on the server. */
export function WeightCaution({ slab }: { slab: Pick<SlabDetail, 'weightLb' | 'weightAtMcPercent' | 'weightNote' | 'lifting'> }) {
  const m = useMeasures();
  const lift = slab.lifting;
  return (
    <Notice tone="caution" title={`Heavy: about ${m.weight(slab.weightLb)}`}>
      <p>Estimated from the species' density at {formatPercent(slab.weightAtMcPercent)} moisture content. {slab.weightNote}</p>
      <p className="mt-1" data-testid="lifting-advice"><strong>{TIER_TITLE[lift.tier]}.</strong> {lift.message}</p>
      <p className="mt-1 text-sm">
        {lift.basis} Lifting index for one person: {lift.liftingIndex} (above 1 means a higher risk of injury). Keep the slab close,
        lift with your legs and never twist. Forklifts and hoists are run by trained operators only. Follow your local workplace
        rules and licensed practice, and ask the yard crew for help.
      </p>
    </Notice>
  );
}
