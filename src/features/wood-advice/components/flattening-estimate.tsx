import { useState } from 'react';
import { flatteningEstimate, formatCents, parseInches } from '../../../../shared/wood/index';
import { InchesField } from '../../../components/ui/inches-field';
import { useMeasures } from '../../../lib/units';
import { plainWoodError } from '../../../lib/wood-words';
import { Notice } from '../../../components/ui/notice';
import { SafetyNotice } from '../../../components/safety-caution';
import { FINISHING_CAUTION } from '../../../../shared/safety';

type Props = { thicknessIn: number; widthIn: number; lengthIn: number; flatteningPriceCents: number };

/** What the mill's flattening service would leave, from the cup and twist the buyer measures or expects. */
export function FlatteningEstimatePanel({ thicknessIn, widthIn, lengthIn, flatteningPriceCents }: Props) {
  const [deviation, setDeviation] = useState('1/4');
  const m = useMeasures();
  let text: React.ReactNode;
  let problem: string | undefined;
  try {
    const e = flatteningEstimate({ thicknessIn, widthIn, lengthIn, deviationIn: parseInches(deviation) });
    text = e.feasible ? (
      <p>
        {e.passesPerFace.first} passes of {m.length(e.passDepthIn)} take {m.length(e.removedPerFaceIn.first)} off the first face and{' '}
        {e.passesPerFace.second} more take {m.length(e.removedPerFaceIn.second)} off the second ({e.passes} router passes in all);
        finished thickness about <strong>{m.length(e.finishedThicknessIn)}</strong>.
        The service flattens both faces and costs {formatCents(flatteningPriceCents)} for this slab, charged on the area of one face
        ({m.area(e.faceAreaSqFt)}).
      </p>
    ) : (
      <Notice tone="caution">{e.reason}</Notice>
    );
  } catch (err) {
    problem = plainWoodError(err, { deviationIn: { label: 'The cup and twist', unit: 'in' } }, 'Enter the cup and twist in inches, like 1/4 or 0.25.');
    text = null;
  }
  return (
    <section aria-labelledby="flattening" className="rounded-lg border border-line bg-surface-raised p-4">
      <h2 id="flattening" className="text-xl font-bold">Flattening service</h2>
      <p className="mb-3 text-ink-soft">We can flatten both faces with a router sled before pickup (about 1/8 in per pass).</p>
      <InchesField label="Largest cup plus twist (in)" hint="Lay a straightedge across and along the slab and measure the biggest gap, like 3/8 or 0.375." value={deviation} error={problem} onChange={(e) => setDeviation(e.target.value)} className="max-w-xs" />
      <div aria-live="polite" className="mt-3">{text}</div>
      <div className="mt-3">
        <Notice tone="caution" title="Wood dust is a health hazard">
          Flattening and sanding make fine dust; wood dust is classed as a human carcinogen (IARC Monograph vol. 62). If you do this yourself,
          use dust collection and a fitted respirator, and follow your local workplace rules and licensed practice.
        </Notice>
      </div>
      <div className="mt-3"><SafetyNotice caution={FINISHING_CAUTION} /></div>
    </section>
  );
}
