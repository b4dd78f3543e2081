import { Link } from 'react-router';
import { useQuery } from '@tanstack/react-query';
import { SAWING_METHOD_LABELS } from '../../../../shared/slabs';
import { Length } from '../../../lib/units';
import { buttonClass } from '../../../components/ui/button';
import { PageTitle } from '../../../components/ui/page-title';
import { paths } from '../../../paths';
import { logListQuery } from '../api';

export function LogList() {
  const { data: logs = [] } = useQuery(logListQuery());
  return (
    <div className="grid gap-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <PageTitle>Log book</PageTitle>
        <Link to={paths.yardLogNew()} className={buttonClass('primary')}>Record a log</Link>
      </div>
      {logs.length === 0 ? <p>No logs recorded yet.</p> : (
        <div className="overflow-x-auto">
          <table className="w-full min-w-[40rem] border-collapse text-left">
            <caption className="sr-only">Logs, newest first</caption>
            <thead className="border-b border-line text-sm text-ink-soft">
              <tr><th className="p-2">Code</th><th className="p-2">Species</th><th className="p-2">Length × butt / top</th><th className="p-2">Sawing</th><th className="p-2">Milled</th><th className="p-2 text-right">Slabs</th></tr>
            </thead>
            <tbody>
              {logs.map((l) => (
                <tr key={l.id} className="border-b border-line">
                  <td className="p-2 font-semibold"><Link className="text-accent underline" to={paths.yardLog(l.id)}>{l.code}</Link></td>
                  <td className="p-2">{l.species.name}</td>
                  <td className="p-2"><Length inches={l.lengthIn} /> × <Length inches={l.buttDiameterIn} /> / <Length inches={l.topDiameterIn} /></td>
                  <td className="p-2">{SAWING_METHOD_LABELS[l.sawingMethod]}</td>
                  <td className="p-2">{l.milledOn ?? 'Not yet'}</td>
                  <td className="p-2 text-right">{l.slabCount}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
