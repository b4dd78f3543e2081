import { useId, useMemo, useState } from 'react';
import { CHAINSAW_KERF_IN, cutPlan, formatPercent, inchesForInput, parseInches } from '../../../../shared/wood/index';
import { InchesField } from '../../../components/ui/inches-field';
import { useMeasures } from '../../../lib/units';
import { plainWoodError } from '../../../lib/wood-words';
import { SelectField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { SafetyNotice } from '../../../components/safety-caution';
import { SAWING_CAUTION } from '../../../../shared/safety';
import type { LogDetail } from '../../../../shared/logs';

type Measure = 'top' | 'middle' | 'butt';

/** Lets the mill try slab thicknesses and saw kerfs on this log before the first cut. */
export function CutPlanPanel({ log }: { log: LogDetail }) {
  const [thickness, setThickness] = useState('2 1/2');
  const [kerf, setKerf] = useState(inchesForInput(CHAINSAW_KERF_IN));
  const m = useMeasures();
  const [measure, setMeasure] = useState<Measure>('top');
  const headingId = useId();
  const diameterIn = measure === 'top' ? log.topDiameterIn : measure === 'butt' ? log.buttDiameterIn : (log.topDiameterIn + log.buttDiameterIn) / 2;

  const result = useMemo(() => {
    let greenThicknessIn: number;
    let kerfIn: number;
    try { greenThicknessIn = parseInches(thickness, { thickness: true }); } catch (e) { return { thicknessError: plainWoodError(e, {}) }; }
    try { kerfIn = parseInches(kerf); } catch (e) { return { kerfError: plainWoodError(e, {}) }; }
    try {
      return { plan: cutPlan({ diameterIn, greenThicknessIn, kerfIn, dryToMcPercent: log.targetMcPercent, speciesSlug: log.species.slug, sawingMethod: log.sawingMethod }) };
    } catch (e) {
      return {
        error: plainWoodError(e, {
          greenThicknessIn: { label: 'The green thickness' }, kerfIn: { label: 'The saw kerf' }, diameterIn: { label: 'The diameter' },
        }, 'This species has no shrinkage data, so no plan can be drawn.'),
      };
    }
  }, [diameterIn, thickness, kerf, log.targetMcPercent, log.species.slug, log.sawingMethod]);

  return (
    <section aria-labelledby={headingId} className="grid gap-3 rounded-md border border-line bg-surface-raised p-4">
      <h2 id={headingId} className="text-xl font-bold">Cut plan</h2>
      <p className="text-sm text-ink-soft">A sketch before sawing: how many slabs of a chosen green thickness fit across the log, how wide each is, and how thick it ends up after drying and flattening.</p>
      <div className="grid gap-3 sm:grid-cols-3">
        <InchesField label="Slab thickness when green (in)" hint="2 1/2, 2.5 or 10/4" value={thickness} error={result.thicknessError} onChange={(e) => setThickness(e.target.value)} />
        <InchesField label="Saw kerf (in)" hint="About 3/8 for a chainsaw mill, 1/8 for a band mill." value={kerf} error={result.kerfError} onChange={(e) => setKerf(e.target.value)} />
        <SelectField label="Diameter used" value={measure} onChange={(e) => setMeasure(e.target.value as Measure)}>
          <option value="top">Small end ({m.length(log.topDiameterIn)}) — full-length width</option>
          <option value="middle">Middle ({m.length((log.topDiameterIn + log.buttDiameterIn) / 2)})</option>
          <option value="butt">Butt ({m.length(log.buttDiameterIn)})</option>
        </SelectField>
      </div>
      {!result.plan ? (result.error && <Notice tone="danger" role="alert">{result.error}</Notice>) : (
        <>
          <p aria-live="polite"><strong>{result.plan.count} slabs</strong>; {result.plan.kerfCuts} cuts turn {m.length(result.plan.kerfTotalIn)} of the diameter ({formatPercent(result.plan.kerfAreaPercent)} of the end grain) into sawdust; about {m.length(result.plan.offcutEachSideIn)} is left on each outside.</p>
          <div className="overflow-x-auto">
            <table className="w-full min-w-[32rem] border-collapse text-left text-sm">
              <thead className="border-b border-line text-ink-soft">
                <tr><th className="p-2">Slab</th><th className="p-2">Width at centre</th><th className="p-2">Narrow face</th><th className="p-2">Green</th><th className="p-2">Dried to {formatPercent(log.targetMcPercent)}</th><th className="p-2">Flattened</th></tr>
              </thead>
              <tbody>
                {result.plan.slabs.map((s) => (
                  <tr key={s.index} className="border-b border-line">
                    <th scope="row" className="p-2">{s.index}{s.containsPith ? ' (pith)' : ''}</th>
                    <td className="p-2">{m.length(s.widthIn)}</td>
                    <td className="p-2">{m.length(s.narrowFaceWidthIn)}</td>
                    <td className="p-2">{m.length(s.greenThicknessIn)}</td>
                    <td className="p-2">{m.length(s.driedThicknessIn)}</td>
                    <td className="p-2">{m.length(s.flattenedThicknessIn)}{s.flattenable ? '' : ` — under ${m.length(1)}`}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <p className="text-sm text-ink-soft">{result.plan.shrinkageNote} Flattening takes one {m.length(1 / 8)} pass off each face. A slab holding the pith usually checks as it dries.</p>
        </>
      )}
      <SafetyNotice caution={SAWING_CAUTION} />
    </section>
  );
}
