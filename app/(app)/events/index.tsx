import { EventsScreen } from '@/components/events/events-screen';
export default EventsScreen;
