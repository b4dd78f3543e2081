import { Notice } from '../../../components/ui/notice';
import type { SlabDetail } from '../../../../shared/slabs';
import { formatPercent, NIOSH_LOAD_CONSTANT_LB } from '../../../../shared/wood/index';
import { useMeasures } from '../../../lib/units';

/** Weight now and the lifting caution; figures come from the shared wood math on the server. */
export function WeightCaution({ slab }: { slab: Pick<SlabDetail, 'weightLb' | 'weightAtMcPercent' | 'lifting' | 'moisturePercent'> }) {
  const m = useMeasures();
  return (
    <Notice tone="caution" title={`Heavy: about ${m.weight(slab.weightLb)}`}>
      <p>
        Estimated from the species' density at {formatPercent(slab.weightAtMcPercent)} moisture content
        {slab.moisturePercent === null ? ' (no reading yet, so we assume air-dry)' : ' (latest reading)'}.
      </p>
      <p className="mt-1">{slab.lifting.message}</p>
      <p className="mt-1 text-sm">
        Guidance based on the NIOSH lifting equation (load constant {m.weight(NIOSH_LOAD_CONSTANT_LB)} per person, NIOSH Pub. 94-110). Lift with your legs, keep
        the slab close, and use straps or a cart. Follow your local workplace rules and get help from the yard crew.
      </p>
    </Notice>
  );
}
