import { lazy, Suspense, type ReactNode } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router';
import { slabDetailQuery } from '../api';
import { PhotoGallery } from './photo-gallery';
import { PriceBreakdown } from './price-breakdown';
import { LogSequence } from './log-sequence';
import { WeightCaution } from './weight-caution';
import { MeasurementsTable } from './measurements-table';
import { SafetyNotice } from '../../../components/safety-caution';
import { FINISHING_CAUTION } from '../../../../shared/safety';
import { DryingForecastNote } from '../../../components/wood/drying-forecast';
import { PageTitle } from '../../../components/ui/page-title';
import { Tag } from '../../../components/ui/tag';
import { paths } from '../../../paths';
import { isSold, priceWords, STATUS_LABELS, SAWING_METHOD_LABELS, type SlabDetail } from '../../../../shared/slabs';
import { setWords } from '../../../../shared/matched-sets';
import { DRYING_STATES, formatCents } from '../../../../shared/wood/index';

/** The one sentence about book-matching, written from the set the yard marked (never from the log order). */
function MatchedSetNote({ slab }: { slab: SlabDetail }) {
  const others = (slab.matchedSet?.slabs ?? []).filter((m) => m.id !== slab.id);
  if (!others.length) return null;
  return (
    <p className="border-l-2 border-accent pl-2 text-accent-strong">
      Book-matched with {others.map((m, i) => (
        <span key={m.id}>{i > 0 && (i === others.length - 1 ? ' and ' : ', ')}<Link to={paths.slab(m.id)} className="underline">{m.code}</Link></span>
      ))}: sawn in a row from log {slab.log.code}, so the faces mirror each other — the yard marked them as a {setWords(others.length + 1)}.
    </p>
  );
}

const MoistureChart = lazy(() => import('./moisture-chart'));

/** Slots other features fill in (reserve button, fit check) without this page importing them. */
export type SlabPageSlots = { actions?: (slabId: number) => ReactNode; extras?: (slabId: number) => ReactNode };

export function SlabPage({ slots = {} }: { slots?: SlabPageSlots }) {
  const id = Number(useParams().slabId);
  const { data: slab } = useQuery(slabDetailQuery(id));
  if (!slab) return null;
  const drying = DRYING_STATES.find((d) => d.state === slab.dryingState);

  return (
    <article className="flex flex-col gap-6">
      <nav aria-label="Breadcrumb" className="text-sm"><Link to={paths.catalogue()} className="text-accent underline">All slabs</Link> / {slab.code}</nav>
      <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
        <div className="flex flex-col gap-4">
          <PhotoGallery photos={slab.photos} code={slab.code} />
          {slab.description && <p>{slab.description}</p>}
          <MatchedSetNote slab={slab} />
        </div>
        <div className="flex flex-col gap-4">
          <div>
            <p className="text-ink-soft">Slab {slab.code} · <i>{slab.species.botanicalName}</i></p>
            <PageTitle title={`${slab.species.name} slab ${slab.code}`}>{slab.species.name} slab</PageTitle>
            <div className="mt-2 flex flex-wrap gap-2">
              <Tag tone={slab.status === 'listed' ? 'moss' : slab.status === 'held' ? 'caution' : 'neutral'}>{STATUS_LABELS[slab.status]}</Tag>
              {drying && <Tag tone="accent">{drying.label}</Tag>}
            </div>
          </div>
          <p className="text-3xl font-bold text-accent-strong">{priceWords(slab.status, slab.priceBreakdown?.totalCents ?? slab.priceCents, formatCents)}</p>
          {slots.actions?.(slab.id)}
          {slab.priceBreakdown && (
            <PriceBreakdown breakdown={slab.priceBreakdown} caption={isSold(slab.status) ? 'How the price was worked out when it sold' : undefined} />
          )}
          <WeightCaution slab={slab} />
        </div>
      </div>

      <section aria-labelledby="measures" className="grid gap-6 lg:grid-cols-2">
        <div>
          <h2 id="measures" className="mb-2 text-xl font-bold">Measurements</h2>
          <MeasurementsTable slab={slab} />
          {slab.defects.some((d) => /epoxy|resin|fill|finish|oil/i.test(d.note)) && (
            <div className="mt-2"><SafetyNotice caution={FINISHING_CAUTION} /></div>
          )}
        </div>
        <div>
          <h2 className="mb-2 text-xl font-bold">Drying history</h2>
          {slab.moistureReadings.length ? (
            <Suspense fallback={<p>Loading chart…</p>}>
              <MoistureChart readings={slab.moistureReadings} targetMcPercent={slab.targetMcPercent} />
            </Suspense>
          ) : <p>No moisture readings yet.</p>}
          <p className="mt-2 text-sm">
            {slab.moisturePercent !== null && <>Latest reading {slab.moisturePercent} % MC ({slab.moistureReadings.at(-1)?.meterKind} meter, {slab.moistureReadings.at(-1)?.measuredOn}). </>}
            {drying && <>{drying.description} </>}
            The mill's target for furniture stock is {slab.targetMcPercent} % MC; outdoors a slab only dries to about the yard's
            average equilibrium moisture, so the last step happens indoors.
          </p>
          <div className="mt-2"><DryingForecastNote forecast={slab.dryingForecast} /></div>
        </div>
      </section>

      {slots.extras?.(slab.id)}

      <section aria-labelledby="from-log">
        <h2 id="from-log" className="text-xl font-bold">From log {slab.log.code}</h2>
        <p className="mb-2 text-ink-soft">
          {SAWING_METHOD_LABELS[slab.log.sawingMethod as keyof typeof SAWING_METHOD_LABELS] ?? slab.log.sawingMethod}
          {slab.log.felledOn && ` · felled ${slab.log.felledOn}`}{slab.log.milledOn && ` · milled ${slab.log.milledOn}`}. {slab.log.originNote}
        </p>
        <LogSequence neighbours={slab.neighbours} matchedSet={slab.matchedSet} />
      </section>
    </article>
  );
}
