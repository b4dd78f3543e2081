import { ComparePage } from '../features/buyer-lists/components/compare-page';

/** Anyone may compare: the list lives in the browser, the slabs come from the public catalogue. */
export function Component() {
  return <ComparePage />;
}
