import { ReviewScreen } from '@/components/review/review-screen';
import { WithIdParam } from '@/components/shell/id-param';

export default function ReviewRoute() {
  return <WithIdParam name="eventId" render={(id) => <ReviewScreen key={id} eventId={id} />} />;
}
