import { MailboxScreen } from '@/components/shell/mailbox-screen';
export default MailboxScreen;
