import { MembersScreen } from '@/components/club/members-screen';
export default MembersScreen;
