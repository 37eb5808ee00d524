import { SurveyScreen } from '@/components/survey/survey-screen';
import { WithIdParam } from '@/components/shell/id-param';

export default function SurveyRoute() {
  return <WithIdParam name="siteId" render={(id) => <SurveyScreen key={id} siteId={id} />} />;
}
