import { useQuery } from '@tanstack/react-query';
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { PageTitle } from '../../../components/ui/page-title';
import { formatCents, plainNumber } from '../../../../shared/wood/index';
import type { MillNumbers, SalesMoney } from '../../../../shared/office';
import { SLAB_STATUS_LABELS, type SlabStatus } from '../../../../shared/slabs';
import { numbersQuery } from '../api';

// Species colours picked from the theme's wood tones so the stacks stay readable side by side.
const PALETTE = ['#7a4a24', '#4f6b3a', '#b7832f', '#8c3b2e', '#3f5f6e', '#a0662e', '#5d4a6b', '#6f7d44'];
const CHARTED_STATUSES: SlabStatus[] = ['drying', 'ready', 'listed', 'held'];

/** One row per month with one column per species: the shape a stacked bar chart wants. */
function byMonth(sales: MillNumbers['sales'], field: 'boardFeet' | 'revenueCents') {
  const months = [...new Set(sales.map((s) => s.month))].sort();
  return months.map((month) => ({
    month,
    ...Object.fromEntries(sales.filter((s) => s.month === month).map((s) => [s.speciesName, field === 'revenueCents' ? s.revenueCents / 100 : s.boardFeet])),
  }));
}

export function NumbersPage() {
  const { data } = useQuery(numbersQuery());
  if (!data) return null;
  const species = [...new Set(data.sales.map((s) => s.speciesName))].sort();
  const counts = CHARTED_STATUSES.map((s) => ({ status: SLAB_STATUS_LABELS[s], count: data.statusCounts.find((c) => c.status === s)?.count ?? 0 }));
  return (
    <div className="flex flex-col gap-6">
      <PageTitle>The mill's numbers</PageTitle>
      <p className="text-lg">
        {data.averageDaysMilledToSold === null
          ? 'No sold slab has a milling date yet.'
          : `On average a slab sold ${data.averageDaysMilledToSold} days after its log was milled (over ${data.soldSlabsWithMillDate} sold slabs).`}
      </p>
      <ChartBox title="Board feet sold per month, by species">
        <BarChart data={byMonth(data.sales, 'boardFeet')}>
          <CartesianGrid strokeDasharray="3 3" /><XAxis dataKey="month" /><YAxis /><Tooltip /><Legend />
          {species.map((s, i) => <Bar key={s} dataKey={s} stackId="bf" fill={PALETTE[i % PALETTE.length]} />)}
        </BarChart>
      </ChartBox>
      <ChartBox title="Revenue per month, net of refunds (dollars), by species">
        <BarChart data={byMonth(data.sales, 'revenueCents')}>
          <CartesianGrid strokeDasharray="3 3" /><XAxis dataKey="month" /><YAxis /><Tooltip /><Legend />
          {species.map((s, i) => <Bar key={s} dataKey={s} stackId="rev" fill={PALETTE[i % PALETTE.length]} />)}
        </BarChart>
      </ChartBox>
      <ChartBox title="Slabs in the yard by state">
        <BarChart data={counts}>
          <CartesianGrid strokeDasharray="3 3" /><XAxis dataKey="status" /><YAxis allowDecimals={false} /><Tooltip />
          <Bar dataKey="count" name="Slabs" fill={PALETTE[1]} />
        </BarChart>
      </ChartBox>
      <NumbersTables data={data} />
      <DryingStockTable data={data} />
    </div>
  );
}

const BASIS_WORDS: Record<string, string> = {
  'fitted-curve': 'fitted to its readings', 'rule-of-thumb': 'rule of thumb (a year per inch)', 'already-reached': 'already air-dry',
  'not-reachable': 'not by air drying', 'not-enough-data': 'not enough data',
};

/** Drying stock with the date each slab should reach the air-dry line, soonest first. */
function DryingStockTable({ data }: { data: MillNumbers }) {
  return (
    <section aria-labelledby="drying-stock-h" className="flex flex-col gap-2">
      <h2 id="drying-stock-h" className="font-display text-lg font-bold">Drying stock: when it should be air-dry (20 %)</h2>
      <p className="text-sm text-ink-soft">
        Each date comes from the slab's own moisture readings (an exponential approach to the yard's equilibrium moisture, fitted once
        there are three readings), otherwise from the rule of thumb of about a year per inch of thickness (common practice). The range is
        the likely spread.
      </p>
      {data.dryingStock.length === 0 ? <p>No slabs are drying.</p> : (
        <table className="w-full max-w-3xl text-left text-sm">
          <caption className="sr-only">Drying stock, soonest expected air-dry date first</caption>
          <thead><tr className="border-b border-line"><th scope="col">Slab</th><th scope="col">Species</th><th scope="col">Latest MC</th><th scope="col">Expected</th><th scope="col">Range</th><th scope="col">From</th></tr></thead>
          <tbody>
            {data.dryingStock.map((d) => (
              <tr key={d.id} className="border-b border-line/60">
                <td>{d.code}</td><td>{d.speciesName}</td><td>{d.moisturePercent === null ? '—' : `${d.moisturePercent} %`}</td>
                <td>{d.expectedOn ?? '—'}</td><td>{d.earliestOn && d.latestOn && d.earliestOn !== d.latestOn ? `${d.earliestOn} – ${d.latestOn}` : '—'}</td>
                <td>{BASIS_WORDS[d.basis] ?? d.basis}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}

function ChartBox({ title, children }: { title: string; children: React.ReactElement }) {
  return (
    <section className="rounded-lg border border-line bg-surface-raised p-3">
      <h2 className="font-display text-lg font-bold">{title}</h2>
      {/* The charts are pictures of the tables below, which carry the same numbers for screen readers. */}
      <div className="mt-2 h-72" aria-hidden="true"><ResponsiveContainer width="100%" height="100%">{children}</ResponsiveContainer></div>
    </section>
  );
}

function NumbersTables({ data }: { data: MillNumbers }) {
  return (
    <section aria-labelledby="numbers-table-h" className="flex flex-col gap-4">
      <h2 id="numbers-table-h" className="font-display text-lg font-bold">The same numbers as tables</h2>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[44rem] text-left text-sm">
          <caption className="text-left font-semibold">Sold per month and species (refunds count against the month of the sale)</caption>
          <thead><tr className="border-b border-line"><th scope="col">Month</th><th scope="col">Species</th><th scope="col">Slabs</th><th scope="col">Board feet</th><th scope="col">Wood</th><th scope="col">Services</th><th scope="col">Refunded</th><th scope="col">Revenue (net)</th><th scope="col">Sales tax (net)</th></tr></thead>
          <tbody>
            {data.sales.map((s) => (
              <tr key={`${s.month}-${s.speciesName}`} className="border-b border-line/60">
                <td>{s.month}</td><td>{s.speciesName}</td><td>{s.slabs}</td><td>{plainNumber(s.boardFeet, 2)}</td>
                <MoneyCells m={s} />
              </tr>
            ))}
            {data.sales.length > 0 && (
              <tr className="font-semibold"><th scope="row" colSpan={4}>All months</th><MoneyCells m={data.totals} /></tr>
            )}
            {!data.sales.length && <tr><td colSpan={9}>Nothing sold yet.</td></tr>}
          </tbody>
        </table>
      </div>
      <table className="w-full max-w-md text-left text-sm">
        <caption className="text-left font-semibold">Slabs by state</caption>
        <thead><tr className="border-b border-line"><th scope="col">State</th><th scope="col">Slabs</th></tr></thead>
        <tbody>
          {data.statusCounts.map((c) => <tr key={c.status} className="border-b border-line/60"><td>{SLAB_STATUS_LABELS[c.status as SlabStatus] ?? c.status}</td><td>{c.count}</td></tr>)}
        </tbody>
      </table>
    </section>
  );
}

function MoneyCells({ m }: { m: SalesMoney }) {
  const refunded = m.refundedWoodCents + m.refundedServicesCents + m.refundedTaxCents;
  return (
    <>
      <td>{formatCents(m.woodCents)}</td><td>{formatCents(m.servicesCents)}</td><td>{refunded ? `−${formatCents(refunded)}` : formatCents(0)}</td>
      <td>{formatCents(m.revenueCents)}</td><td>{formatCents(m.netTaxCents)}</td>
    </>
  );
}
