import { NotFoundScreen } from '@/components/shell/not-found-screen';
export default NotFoundScreen;
