import { EventFormScreen } from '@/components/events/event-form-screen';
export default function NewEventRoute() {
  return <EventFormScreen />;
}
