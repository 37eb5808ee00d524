import { SitesScreen } from '@/components/sites/sites-screen';
export default SitesScreen;
