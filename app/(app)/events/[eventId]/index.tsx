import { EventDetailScreen } from '@/components/events/event-detail-screen';
import { WithIdParam } from '@/components/shell/id-param';
export default function EventRoute() {
  return <WithIdParam name="eventId" render={(id) => <EventDetailScreen key={id} eventId={id} />} />;
}
