import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { SelectField, TextField } from '../../../components/ui/field';
import { friendlyMessage } from '../../../lib/api-client';
import { formatWindow, WEEKDAY_NAMES } from '../../../../shared/pickups';
import type { PickupOrder, PickupWindowView } from '../../../../shared/office';
import { useMarkNoShow, useMarkPickedUp, useReschedule } from '../api';
import { ConfirmDialog } from './confirm-dialog';

type Action = 'picked-up' | 'no-show' | 'reschedule' | null;
const NO_SHOW_TEXT = {
  keep: 'The slabs stay set aside for this buyer; you can reschedule later.',
  'release-and-refund': 'The slabs go back on sale and what is left of the payment is refunded to the buyer.',
};

/** The three things the yard can record about an order on the board, each asked once more before it happens. */
export function PickupActions({ order, windows, noShowRule }: { order: PickupOrder; windows: PickupWindowView[]; noShowRule: keyof typeof NO_SHOW_TEXT }) {
  const [action, setAction] = useState<Action>(null);
  const [day, setDay] = useState('');
  const [windowId, setWindowId] = useState('');
  const pickedUp = useMarkPickedUp();
  const noShow = useMarkNoShow();
  const reschedule = useReschedule();
  const busy = pickedUp.isPending || noShow.isPending || reschedule.isPending;
  const error = pickedUp.error ?? noShow.error ?? reschedule.error;
  const weekday = day ? new Date(`${day}T00:00:00Z`).getUTCDay() : null;
  const fitting = windows.filter((w) => w.weekday === weekday);

  const close = () => { setAction(null); pickedUp.reset(); noShow.reset(); reschedule.reset(); };
  const confirm = () => {
    const done = { onSuccess: () => setAction(null) };
    if (action === 'picked-up') pickedUp.mutate(order.id, done);
    if (action === 'no-show') noShow.mutate(order.id, done);
    if (action === 'reschedule') reschedule.mutate({ orderId: order.id, pickupOn: day, pickupWindowId: Number(windowId) }, done);
  };
  const waiting = order.status === 'paid' || order.status === 'no-show';
  if (!waiting) return null;

  return (
    <div className="flex flex-wrap gap-2">
      <Button variant="primary" onClick={() => setAction('picked-up')}>Picked up</Button>
      {order.status === 'paid' && order.pickupStarted && <Button variant="secondary" onClick={() => setAction('no-show')}>Did not come</Button>}
      <Button variant="quiet" onClick={() => setAction('reschedule')}>Move pickup</Button>
      <ConfirmDialog open={action !== null} busy={busy} onCancel={close} onConfirm={confirm}
        tone={action === 'no-show' ? 'danger' : 'primary'}
        title={action === 'picked-up' ? `Hand over order ${order.code}?` : action === 'no-show' ? `Mark ${order.code} as not collected?` : `Move the pickup of ${order.code}`}
        confirmLabel={action === 'picked-up' ? 'Yes, picked up' : action === 'no-show' ? 'Yes, did not come' : 'Move and e-mail the buyer'}>
        {action === 'picked-up' && <p>Slabs {order.slabCodes.join(', ')} leave the yard with {order.buyerName}. Your name and the time are recorded.</p>}
        {action === 'no-show' && <p>{NO_SHOW_TEXT[noShowRule]}</p>}
        {action === 'reschedule' && (
          <>
            <TextField label="New pickup day" type="date" value={day} onChange={(e) => { setDay(e.target.value); setWindowId(''); }} />
            <SelectField label="Window" value={windowId} onChange={(e) => setWindowId(e.target.value)} disabled={!day}
              hint={day && !fitting.length ? `No pickup window runs on ${WEEKDAY_NAMES[weekday!]}s.` : undefined}>
              <option value="">Choose a window</option>
              {fitting.map((w) => <option key={w.id} value={w.id}>{formatWindow(w)} ({w.capacity} places)</option>)}
            </SelectField>
          </>
        )}
        {error && <Notice tone="danger" role="alert">{friendlyMessage(error)}</Notice>}
      </ConfirmDialog>
    </div>
  );
}
