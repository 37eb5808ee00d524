import { EventFormScreen } from '@/components/events/event-form-screen';
import { WithIdParam } from '@/components/shell/id-param';
export default function EditEventRoute() {
  return <WithIdParam name="eventId" render={(id) => <EventFormScreen key={id} eventId={id} />} />;
}
