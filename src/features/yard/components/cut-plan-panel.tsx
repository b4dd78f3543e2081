import { useId, useMemo, useState } from 'react';
import { CHAINSAW_KERF_IN, cutPlan, toSixteenths, WoodMathError } from '../../../../shared/wood/index';
import { SelectField, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import type { LogSummary } from '../../../../shared/logs';

type Measure = 'top' | 'middle' | 'butt';

/** Lets the mill try slab thicknesses and saw kerfs on this log before the first cut. */
export function CutPlanPanel({ log }: { log: LogSummary }) {
  const [thickness, setThickness] = useState('2.5');
  const [kerf, setKerf] = useState(String(CHAINSAW_KERF_IN));
  const [measure, setMeasure] = useState<Measure>('top');
  const headingId = useId();
  const diameterIn = measure === 'top' ? log.topDiameterIn : measure === 'butt' ? log.buttDiameterIn : (log.topDiameterIn + log.buttDiameterIn) / 2;

  const result = useMemo(() => {
    try {
      return { plan: cutPlan({ diameterIn, greenThicknessIn: Number(thickness), kerfIn: Number(kerf), speciesSlug: log.species.slug, sawingMethod: log.sawingMethod }) };
    } catch (e) {
      return { error: e instanceof WoodMathError ? e.message : 'This species has no shrinkage data, so no plan can be drawn.' };
    }
  }, [diameterIn, thickness, kerf, log.species.slug, log.sawingMethod]);

  return (
    <section aria-labelledby={headingId} className="grid gap-3 rounded-md border border-line bg-surface-raised p-4">
      <h2 id={headingId} className="text-xl font-bold">Cut plan</h2>
      <p className="text-sm text-ink-soft">A sketch before sawing: how many slabs of a chosen green thickness fit across the log, how wide each is, and how thick it ends up after drying and flattening.</p>
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField label="Slab thickness when green (in)" type="number" inputMode="decimal" step="0.125" min="0.25" value={thickness} onChange={(e) => setThickness(e.target.value)} />
        <TextField label="Saw kerf (in)" hint="About 3/8 for a chainsaw mill, 1/8 for a band mill." type="number" inputMode="decimal" step="0.0625" min="0" value={kerf} onChange={(e) => setKerf(e.target.value)} />
        <SelectField label="Diameter used" value={measure} onChange={(e) => setMeasure(e.target.value as Measure)}>
          <option value="top">Small end ({toSixteenths(log.topDiameterIn)} in) — full-length width</option>
          <option value="middle">Middle ({toSixteenths((log.topDiameterIn + log.buttDiameterIn) / 2)} in)</option>
          <option value="butt">Butt ({toSixteenths(log.buttDiameterIn)} in)</option>
        </SelectField>
      </div>
      {'error' in result ? <Notice tone="danger" role="alert">{result.error}</Notice> : (
        <>
          <p aria-live="polite"><strong>{result.plan.count} slabs</strong>; {result.plan.kerfCuts} cuts turn {toSixteenths(result.plan.kerfTotalIn)} in of the diameter ({result.plan.kerfAreaPercent.toFixed(1)} % of the end grain) into sawdust; about {toSixteenths(result.plan.offcutEachSideIn)} in is left on each outside.</p>
          <div className="overflow-x-auto">
            <table className="w-full min-w-[32rem] border-collapse text-left text-sm">
              <thead className="border-b border-line text-ink-soft">
                <tr><th className="p-2">Slab</th><th className="p-2">Width at centre</th><th className="p-2">Narrow face</th><th className="p-2">Green</th><th className="p-2">Dried to 8 %</th><th className="p-2">Flattened</th></tr>
              </thead>
              <tbody>
                {result.plan.slabs.map((s) => (
                  <tr key={s.index} className="border-b border-line">
                    <th scope="row" className="p-2">{s.index}{s.containsPith ? ' (pith)' : ''}</th>
                    <td className="p-2">{toSixteenths(s.widthIn)} in</td>
                    <td className="p-2">{toSixteenths(s.narrowFaceWidthIn)} in</td>
                    <td className="p-2">{toSixteenths(s.greenThicknessIn)} in</td>
                    <td className="p-2">{toSixteenths(s.driedThicknessIn)} in</td>
                    <td className="p-2">{toSixteenths(s.flattenedThicknessIn)} in{s.flattenable ? '' : ' — under 1 in'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <p className="text-sm text-ink-soft">{result.plan.shrinkageNote} Flattening takes one 1/8 in pass off each face. A slab holding the pith usually checks as it dries.</p>
        </>
      )}
      <Notice tone="caution" title="Sawing safely">
        Chainsaw milling throws chips and fine dust and the logs roll: wear eye, ear and chainsaw protection, chock the log, and follow the saw maker’s instructions and your local rules.
      </Notice>
    </section>
  );
}
