import { CreateClubScreen } from '@/components/club/create-club-screen';
export default CreateClubScreen;
