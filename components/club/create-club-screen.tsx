import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'expo-router';
import { useForm } from 'react-hook-form';
import { Button, Card, ErrorText, FormTextField, Screen, Txt } from '@/components/ui';
import { colors } from '@/constants/theme';
import { errorMessage, fieldErrors } from '@/hooks/api/client';
import { useCreateClub } from '@/hooks/api/use-clubs';
import { useCurrentClub } from '@/hooks/use-current-club';
import { clubCreateSchema } from '@/shared/schemas';

export function CreateClubScreen() {
  const router = useRouter();
  const create = useCreateClub();
  const { setClubId } = useCurrentClub();
  const { control, handleSubmit } = useForm({ resolver: zodResolver(clubCreateSchema), mode: 'onChange', defaultValues: { name: '', callSign: '' } });
  const server = fieldErrors(create.error);
  const submit = handleSubmit((v) =>
    create.mutate(
      { name: v.name, callSign: v.callSign ?? '' },
      {
        onSuccess: (club) => {
          setClubId(club.id);
          router.replace('/club');
        },
      },
    ),
  );
  return (
    <Screen title="Start a club" subtitle="You become its admin and can invite the others." narrow testID="create-club">
      <Card>
        <FormTextField control={control} name="name" label="Club name" testID="club-name" serverError={server.name} />
        <FormTextField control={control} name="callSign" label="Club call sign (optional)" testID="club-call-sign" autoCapitalize="characters" mono serverError={server.callSign} />
        <Txt variant="caption" color={colors.inkMuted}>
          You can belong to several clubs, with a different role in each.
        </Txt>
        <ErrorText boxed message={create.error ? errorMessage(create.error) : null} testID="club-create-error" />
        <Button label="Start the club" icon="plus" testID="club-create-submit" busy={create.isPending} onPress={submit} style={{ marginTop: 16 }} />
      </Card>
    </Screen>
  );
}
