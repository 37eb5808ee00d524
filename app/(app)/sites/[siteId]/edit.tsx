import { SiteFormScreen } from '@/components/sites/site-form-screen';
import { WithIdParam } from '@/components/shell/id-param';
export default function EditSiteRoute() {
  return <WithIdParam name="siteId" render={(id) => <SiteFormScreen key={id} siteId={id} />} />;
}
