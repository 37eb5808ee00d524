import { PlanScreen } from '@/components/plan/plan-screen';
import { WithIdParam } from '@/components/shell/id-param';

export default function PlanRoute() {
  return <WithIdParam name="eventId" render={(id) => <PlanScreen key={id} eventId={id} />} />;
}
