import type { LoaderFunctionArgs } from 'react-router';
import { queryClient } from '../lib/query-client';
import { requireRoleLoader } from '../features/session/api';
import { orderQuery } from '../features/orders/api';
import { OrderPage } from '../features/orders/components/order-page';
import { LoadingAdvicePanel } from '../features/checkout/components/loading-advice-panel';
import { loadingAdvice } from '../../shared/loading';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireRoleLoader(queryClient, request);
  await queryClient.ensureQueryData(orderQuery(Number(params.orderId)));
  return null;
}

export function Component() {
  return (
    <OrderPage
      bring={(order) => {
        const advice = loadingAdvice(order.lines.map((l) => ({ weightLb: l.weightLb, lengthIn: l.lengthIn })), { loadingHelp: order.loadingHelp });
        return advice && order.status === 'paid' ? <LoadingAdvicePanel advice={advice} loadingHelp={order.loadingHelp} /> : null;
      }}
    />
  );
}
