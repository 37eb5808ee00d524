import { SettingsScreen } from '@/components/shell/settings-screen';
export default SettingsScreen;
