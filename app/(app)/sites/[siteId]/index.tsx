import { SiteDetailScreen } from '@/components/sites/site-detail-screen';
import { WithIdParam } from '@/components/shell/id-param';
export default function SiteRoute() {
  return <WithIdParam name="siteId" render={(id) => <SiteDetailScreen key={id} siteId={id} />} />;
}
