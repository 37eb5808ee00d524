import { SiteFormScreen } from '@/components/sites/site-form-screen';
export default function NewSiteRoute() {
  return <SiteFormScreen />;
}
