import { useState } from 'react';
import { flatteningEstimate, formatCents, toSixteenths, WoodMathError } from '../../../../shared/wood/index';
import { TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';

type Props = { thicknessIn: number; widthIn: number; lengthIn: number; flatteningPriceCents: number };

/** What the mill's flattening service would leave, from the cup and twist the buyer measures or expects. */
export function FlatteningEstimatePanel({ thicknessIn, widthIn, lengthIn, flatteningPriceCents }: Props) {
  const [deviation, setDeviation] = useState('0.25');
  let text: React.ReactNode;
  try {
    const e = flatteningEstimate({ thicknessIn, widthIn, lengthIn, deviationIn: Number(deviation) });
    text = e.feasible ? (
      <p>
        About {toSixteenths(e.removedPerFaceIn.first)} in off the first face and {toSixteenths(e.removedPerFaceIn.second)} in off the second,
        in {e.passes} router passes; finished thickness about <strong>{toSixteenths(e.finishedThicknessIn)} in</strong>.
        The service costs {formatCents(flatteningPriceCents)} for this slab ({e.faceAreaSqFt.toFixed(1)} sq ft face).
      </p>
    ) : (
      <Notice tone="caution">{e.reason}</Notice>
    );
  } catch (err) {
    text = <Notice tone="danger">{err instanceof WoodMathError ? err.message : 'Enter the cup and twist in inches.'}</Notice>;
  }
  return (
    <section aria-labelledby="flattening" className="rounded-lg border border-line bg-surface-raised p-4">
      <h2 id="flattening" className="text-xl font-bold">Flattening service</h2>
      <p className="mb-3 text-ink-soft">We can flatten both faces with a router sled before pickup (about 1/8 in per pass).</p>
      <TextField label="Largest cup plus twist (in)" hint="Lay a straightedge across and along the slab and measure the biggest gap." type="number" inputMode="decimal" step="0.0625" min="0" value={deviation} onChange={(e) => setDeviation(e.target.value)} className="max-w-xs" />
      <div aria-live="polite" className="mt-3">{text}</div>
      <div className="mt-3">
        <Notice tone="caution" title="Wood dust is a health hazard">
          Flattening and sanding make fine dust; wood dust is classed as a human carcinogen (IARC Monograph vol. 62). If you do this yourself,
          use dust collection and a fitted respirator, and follow your local workplace rules.
        </Notice>
      </div>
    </section>
  );
}
