import { useQuery } from '@tanstack/react-query';
import { useRouter } from 'expo-router';
import { useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { colors, spacing } from '@/constants/theme';
import { Button, Card, EmptyState, ErrorText, ListRow, Screen, Tabular, Txt } from '@/components/ui';
import { apiFetch, errorMessage } from '@/hooks/api/client';
import { MailText } from './mail-text';

const mailSchema = z.object({ id: z.string(), to: z.string(), from: z.string(), subject: z.string(), text: z.string(), sentAt: z.string() });
type Mail = z.infer<typeof mailSchema>;

/**
 * /mailbox: every e-mail the server "sent" through the fake transport, so invitations and password
 * resets can be followed with no mail account. Open to anyone because the server only offers it in dev.
 */
export function MailboxScreen() {
  const router = useRouter();
  const [openId, setOpenId] = useState<string | null>(null);
  const mails = useQuery({
    queryKey: ['dev-mailbox'],
    queryFn: async () => z.array(mailSchema).parse(await apiFetch('/api/dev/mailbox', { auth: false })),
    refetchInterval: 3000,
    retry: false,
  });
  const open = mails.data?.find((m) => m.id === openId) ?? null;
  return (
    <Screen
      title="Dev mailbox"
      subtitle="E-mail the server sent while no SMTP server is set"
      testID="mailbox"
      actions={<Button label="Back to Loftline" icon="back" variant="secondary" testID="mailbox-home" onPress={() => router.replace('/')} />}
    >
      {mails.isLoading ? <ActivityIndicator color={colors.action} size="large" /> : null}
      <ErrorText boxed message={mails.error ? `${errorMessage(mails.error)} The dev mailbox exists only while the server uses the fake mail transport.` : null} testID="mailbox-error" />
      {mails.data && mails.data.length === 0 ? <EmptyState icon="mail" title="No e-mail yet" body="Invite someone or ask for a password reset; the message appears here within seconds." testID="mailbox-empty" /> : null}
      {open ? <MailCard mail={open} onClose={() => setOpenId(null)} /> : null}
      <View style={styles.list}>
        {mails.data?.map((m) => (
          <ListRow key={m.id} testID={`mail-${m.id}`} title={m.subject} subtitle={`to ${m.to} · ${m.sentAt.replace('T', ' ').slice(0, 16)} UTC`} icon="mail" selected={m.id === openId} onPress={() => setOpenId(m.id)} />
        ))}
      </View>
    </Screen>
  );
}

function MailCard({ mail, onClose }: { mail: Mail; onClose: () => void }) {
  return (
    <Card title={mail.subject} testID="mail-open" right={<Button label="Close" variant="quiet" compact testID="mail-close" onPress={onClose} />}>
      <Txt variant="caption" color={colors.inkMuted}>
        to {mail.to} · from {mail.from} · <Tabular size={14}>{mail.sentAt}</Tabular>
      </Txt>
      <View style={styles.body}>
        <MailText text={mail.text} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  list: { borderRadius: 12, overflow: 'hidden' },
  body: { marginTop: spacing.m },
});
