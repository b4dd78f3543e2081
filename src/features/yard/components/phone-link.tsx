import { useEffect, useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import QRCode from 'qrcode';
import { Notice } from '../../../components/ui/notice';
import { shopAddressQuery } from '../api';

/** "Open the shop on a phone": a QR code of the shop's public address, for the yard crew's phones. */
export function PhoneLink() {
  const { data } = useQuery(shopAddressQuery());
  const [qr, setQr] = useState<string | null>(null);
  useEffect(() => {
    if (!data?.phonesCanReach) return;
    let live = true;
    QRCode.toDataURL(data.url, { margin: 1, width: 240, errorCorrectionLevel: 'M' }).then((d) => live && setQr(d), () => live && setQr(null));
    return () => { live = false; };
  }, [data?.url, data?.phonesCanReach]);
  if (!data) return null;
  return (
    <details className="rounded-md border border-line bg-surface-raised p-3">
      <summary className="min-h-11 cursor-pointer content-center font-semibold">Open the shop on a phone</summary>
      {data.phonesCanReach ? (
        <div className="mt-2 flex flex-wrap items-center gap-4">
          {qr && <img src={qr} alt={`QR code for ${data.url}`} width={160} height={160} className="size-40 bg-white" />}
          <p className="max-w-sm">Point a phone's camera at the code, or type <strong className="break-all">{data.url}</strong>. The phone must be on the yard's network.</p>
        </div>
      ) : (
        <div className="mt-2">
          <Notice tone="caution" title="Phones cannot open this address yet">
            <p>The shop's address is <strong>{data.url}</strong>, which only this computer can open. Start the shop with
              {' '}<code>HOST=0.0.0.0</code> and <code>PUBLIC_URL</code> set to this computer's address on the yard's network
              {data.suggestions.length > 0 ? <>, for example {data.suggestions.map((s, i) => <span key={s}>{i > 0 && ' or '}<code>{s}</code></span>)}</> : null}.
              The README's “Running it at the mill” section has the steps.</p>
          </Notice>
        </div>
      )}
    </details>
  );
}
