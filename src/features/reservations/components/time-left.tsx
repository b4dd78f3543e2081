import { useEffect, useState } from 'react';
import { MillDateTime } from '../../../lib/dates';

const pad = (n: number) => String(n).padStart(2, '0');

/** "1 d 03:12:09 left", ticking each second; announced to screen readers only when it runs out. */
export function TimeLeft({ until }: { until: string }) {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const t = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(t);
  }, []);
  const ms = Date.parse(until) - now;
  if (ms <= 0) return <span role="status" className="font-semibold text-danger">Hold ended</span>;
  const s = Math.floor(ms / 1000);
  const days = Math.floor(s / 86400);
  const text = `${days ? `${days} d ` : ''}${pad(Math.floor((s % 86400) / 3600))}:${pad(Math.floor((s % 3600) / 60))}:${pad(s % 60)}`;
  return (
    <span className={ms < 3_600_000 ? 'font-semibold text-caution' : 'text-ink'}>
      <span aria-hidden="true">{text} left</span>
      <span className="sr-only">Held until <MillDateTime at={until} /> (mill time)</span>
    </span>
  );
}
