import { SyncProblemsScreen } from '@/components/sync-problems/sync-problems-screen';

export default SyncProblemsScreen;
