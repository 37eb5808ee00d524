import { SheetsScreen } from '@/components/sheets/sheets-screen';
import { WithIdParam } from '@/components/shell/id-param';

export default function SheetRoute() {
  return <WithIdParam name="eventId" render={(eventId) => <WithIdParam name="spotId" render={(spotId) => <SheetsScreen key={spotId} eventId={eventId} spotId={spotId} />} />} />;
}
