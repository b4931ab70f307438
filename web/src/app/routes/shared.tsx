import { useParams, useSearchParams } from 'react-router-dom';
import { SharedJobPage } from '@/features/share-links/components/shared-job-page';

/** A customer's share link: open to anyone holding it, outside the signed-in app. */
export function Component() {
  const { token = '' } = useParams();
  // The payment provider sends the customer back here with ?paid=<the invoice they paid>.
  const paid = useSearchParams()[0].get('paid');
  return <SharedJobPage token={token} paidInvoiceId={paid} />;
}
