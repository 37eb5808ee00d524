import { SheetsScreen } from '@/components/sheets/sheets-screen';
import { WithIdParam } from '@/components/shell/id-param';

export default function SheetsRoute() {
  return <WithIdParam name="eventId" render={(id) => <SheetsScreen key={id} eventId={id} />} />;
}
