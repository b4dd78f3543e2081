import { useEffect, useRef } from 'react';
import { Link, useSearchParams } from 'react-router';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { friendlyMessage } from '../../../lib/api-client';
import { paths } from '../../../paths';
import type { OrderView } from '../../../../shared/checkout';
import { usePaymentReturn } from '../api';

/**
 * What the buyer sees about the payment: on return from the payment page the server is asked to
 * verify it (or to close the page when the buyer turned back); an unpaid attempt is never shown as an order.
 */
export function PaymentState({ order }: { order: OrderView }) {
  const [params, setParams] = useSearchParams();
  const verify = usePaymentReturn(order.id);
  const asked = useRef(false);
  const returned = params.get('payment');
  useEffect(() => {
    if (asked.current || order.status !== 'pending-payment' || (returned !== 'returned' && returned !== 'cancelled')) return;
    asked.current = true;
    verify.mutate(returned === 'returned' ? 'check' : 'cancel', { onSettled: () => setParams({}, { replace: true }) });
  }, [order.status, returned, verify, setParams]);

  if (verify.isPending) return <Notice role="status">Checking your payment with the payment service…</Notice>;
  if (verify.error) return <Notice tone="danger" role="alert">{friendlyMessage(verify.error)}</Notice>;
  if (order.status === 'pending-payment') {
    return (
      <Notice tone="caution" title="Not paid yet" role="status">
        <p>This checkout is waiting for payment. Your slabs stay on hold for you while the payment page is open.</p>
        <div className="mt-2 flex flex-wrap gap-3">
          {order.paymentUrl && <a className="text-accent underline" href={order.paymentUrl}>Go to the payment page</a>}
          <Button type="button" onClick={() => verify.mutate('check')}>I have paid — check again</Button>
        </div>
      </Notice>
    );
  }
  if (order.status === 'abandoned') {
    return (
      <Notice role="status" title="Payment not completed">
        <p>No money was taken and this is not an order. Your holds are kept until they run out.</p>
        <Link className="text-accent underline" to={paths.reservations()}>Back to your reservations</Link>
      </Notice>
    );
  }
  if (order.status === 'paid') return <Notice tone="success" role="status">Paid — a confirmation is on its way by e-mail.</Notice>;
  return null;
}
