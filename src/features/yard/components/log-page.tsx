import { Link, useLocation, useNavigate } from 'react-router';
import { useQuery } from '@tanstack/react-query';
import { SAWING_METHOD_LABELS } from '../../../../shared/slabs';
import { YARD_STATUS_LABELS } from '../../../../shared/slab-input';
import { formatCents } from '../../../../shared/wood/index';
import { BoardFeet, Dimensions, Length } from '../../../lib/units';
import { buttonClass } from '../../../components/ui/button';
import { PageTitle } from '../../../components/ui/page-title';
import { Tag } from '../../../components/ui/tag';
import { paths } from '../../../paths';
import { logDetailQuery } from '../api';
import { CutPlanPanel } from './cut-plan-panel';
import { LogForm } from './log-form';
import { DeleteRecord } from './delete-record';
import { Notice } from '../../../components/ui/notice';
import { MatchedSetsPanel } from './matched-sets-panel';


export function LogPage({ id }: { id: number }) {
  const { data: log } = useQuery(logDetailQuery(id));
  const navigate = useNavigate();
  const notice = (useLocation().state as { notice?: string } | null)?.notice;
  if (!log) return null;
  return (
    <div className="grid gap-6">
      {notice && <Notice tone="success" role="status">{notice}</Notice>}
      <div className="flex flex-wrap items-center justify-between gap-2">
        <PageTitle title={`Log ${log.code}`}>Log {log.code} · {log.species.name}</PageTitle>
        <Link to={paths.yardSlabNew({ logId: log.id })} className={buttonClass('primary')}>Add slab to this log</Link>
      </div>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-1 sm:grid-cols-4">
        <dt className="text-sm text-ink-soft">Length</dt><dd><Length inches={log.lengthIn} /></dd>
        <dt className="text-sm text-ink-soft">Butt / top diameter</dt><dd><Length inches={log.buttDiameterIn} /> / <Length inches={log.topDiameterIn} /></dd>
        <dt className="text-sm text-ink-soft">Felled</dt><dd>{log.felledOn ?? 'Unknown'}</dd>
        <dt className="text-sm text-ink-soft">Milled</dt><dd>{log.milledOn ?? 'Not yet'}</dd>
        <dt className="text-sm text-ink-soft">Sawing</dt><dd>{SAWING_METHOD_LABELS[log.sawingMethod]}</dd>
        <dt className="text-sm text-ink-soft">From</dt><dd className="col-span-3 sm:col-span-1">{log.originNote || '—'}</dd>
      </dl>

      <section aria-labelledby="log-slabs" className="grid gap-2">
        <h2 id="log-slabs" className="text-xl font-bold">Slabs in sawing order</h2>
        {log.slabs.length === 0 ? <p>No slabs recorded from this log yet.</p> : (
          <ol className="grid gap-1">
            {log.slabs.map((s) => (
              <li key={s.id}>
                <div className="flex flex-wrap items-center gap-3 rounded-md border border-line bg-surface-raised p-2">
                  <span className="w-8 text-right font-semibold">{s.sequenceInLog}</span>
                  <Link className="font-semibold text-accent underline" to={paths.yardSlab(s.id)}>{s.code}</Link>
                  <span><Dimensions of={s} /></span>
                  <span><BoardFeet value={s.boardFeet} /></span>
                  <span>{formatCents(s.priceCents)}</span>
                  <Tag tone={s.status === 'listed' ? 'moss' : s.status === 'withdrawn' ? 'danger' : 'neutral'}>{YARD_STATUS_LABELS[s.status]}</Tag>
                </div>
              </li>
            ))}
          </ol>
        )}
      </section>

      {log.slabs.length >= 2 && <MatchedSetsPanel logId={log.id} slabs={log.slabs} />}

      <CutPlanPanel log={log} />

      <details className="rounded-md border border-line bg-surface-raised p-4">
        <summary className="cursor-pointer font-semibold">Edit log details</summary>
        <div className="mt-4"><LogForm log={log} onSaved={() => undefined} /></div>
      </details>
      {log.slabs.length === 0 && (
        <DeleteRecord kind="log" id={log.id} code={log.code} onDeleted={() => navigate(paths.yardLogs())} />
      )}
    </div>
  );
}
