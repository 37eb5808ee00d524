import { Linking } from 'react-native';
import { colors } from '@/constants/theme';
import { Txt } from '@/components/ui';

/** A mail's plain text with its links made pressable (invitation and reset links open in this tab). */
export function MailText({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s]+)/g);
  return (
    <Txt>
      {parts.map((p, i) =>
        /^https?:\/\//.test(p) ? (
          <Txt key={i} color={colors.action} style={{ textDecorationLine: 'underline' }} accessibilityRole="link" testID={`mail-link-${i}`} onPress={() => void openLink(p)}>
            {p}
          </Txt>
        ) : (
          <Txt key={i}>{p}</Txt>
        ),
      )}
    </Txt>
  );
}

async function openLink(url: string) {
  if (typeof window !== 'undefined' && window.location) window.location.assign(url);
  else await Linking.openURL(url);
}
