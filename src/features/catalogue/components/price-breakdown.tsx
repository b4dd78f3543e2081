import type { PriceBreakdownView } from '../../../../shared/slabs';
import { formatCents } from '../../../../shared/wood/index';

/** Every line of the price, so the buyer can check the arithmetic. */
export function PriceBreakdown({ breakdown, caption = 'How the price is worked out' }: { breakdown: PriceBreakdownView; caption?: string }) {
  return (
    <table className="w-full text-left">
      <caption className="mb-1 text-left font-semibold">{caption}</caption>
      <tbody>
        {breakdown.lines.map((line, i) => (
          <tr key={`${line.code}-${i}`} className="border-b border-line">
            <th scope="row" className="py-1 pr-2 font-normal">{line.label}</th>
            <td className="py-1 text-right tabular-nums">{formatCents(line.amountCents)}</td>
          </tr>
        ))}
      </tbody>
      <tfoot>
        <tr>
          <th scope="row" className="py-1 pr-2">Total</th>
          <td className="py-1 text-right font-bold tabular-nums">{formatCents(breakdown.totalCents)}</td>
        </tr>
      </tfoot>
    </table>
  );
}
