import { useEffect, useState } from 'react';
import { useQueries, useQuery } from '@tanstack/react-query';
import QRCode from 'qrcode';
import type { YardSlabDetail } from '../../../../shared/slab-input';
import { BoardFeet, Dimensions } from '../../../lib/units';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { PageTitle } from '../../../components/ui/page-title';
import { paths } from '../../../paths';
import { shopAddressQuery, yardSlabQuery } from '../api';

const MAX_LABELS = 60;

function SlabLabel({ slab }: { slab: YardSlabDetail }) {
  const [qr, setQr] = useState<string | null>(null);
  // The shop's public address, so a label printed at a desk opened on localhost still works on a phone.
  const base = useQuery(shopAddressQuery()).data?.url ?? window.location.origin;
  const url = `${base}${paths.slab(slab.id)}`;
  useEffect(() => {
    let live = true;
    QRCode.toDataURL(url, { margin: 1, width: 240, errorCorrectionLevel: 'M' }).then((d) => live && setQr(d), () => live && setQr(null));
    return () => { live = false; };
  }, [url]);
  return (
    <article className="label-card flex break-inside-avoid gap-3 rounded-md border-2 border-ink bg-white p-3 text-ink">
      {qr ? <img src={qr} alt={`QR code for ${url}`} width={120} height={120} className="size-[120px] shrink-0" /> : <div className="size-[120px] shrink-0" aria-hidden="true" />}
      <div className="grid content-start gap-0.5">
        <p className="font-display text-2xl font-bold">{slab.code}</p>
        <p className="font-semibold">{slab.species.name}</p>
        <p><Dimensions of={slab} /></p>
        <p><BoardFeet value={slab.boardFeet} /></p>
        <p className="text-sm">Kept at: {[slab.yardStack, slab.yardPosition].filter(Boolean).join(' · ') || 'not recorded'}</p>
      </div>
    </article>
  );
}

/** A printable sheet of yard labels: code, species, size in shop fractions, board feet and a QR code to the slab page. */
export function LabelSheet({ ids }: { ids: number[] }) {
  const wanted = ids.slice(0, MAX_LABELS);
  const results = useQueries({ queries: wanted.map((id) => yardSlabQuery(id)) });
  const slabs = results.flatMap((r) => (r.data ? [r.data] : []));
  const failed = results.filter((r) => r.isError).length;
  return (
    <div className="grid gap-4">
      <div className="no-print grid gap-2">
        <PageTitle>Yard labels</PageTitle>
        {ids.length === 0 && <Notice>Tick slabs in the inventory and choose “Print labels”.</Notice>}
        {ids.length > MAX_LABELS && <Notice tone="caution">Only the first {MAX_LABELS} labels are shown; print the rest as a second sheet.</Notice>}
        {failed > 0 && <Notice tone="danger">{failed} slab(s) could not be loaded.</Notice>}
        <div><Button onClick={() => window.print()} disabled={!slabs.length}>Print</Button></div>
        <p className="text-sm text-ink-soft">Staple labels to the slab end, not the face. The QR code opens the public slab page.</p>
      </div>
      <div className="grid gap-3 sm:grid-cols-2 print:grid-cols-2">
        {slabs.map((s) => <SlabLabel key={s.id} slab={s} />)}
      </div>
    </div>
  );
}
