import { useLocalSearchParams } from 'expo-router';
import { idSchema } from '@/shared/schemas';
import { NotFoundScreen } from './not-found-screen';

/** Route adapters validate their id parameter: anything but a UUID is a page that does not exist. */
export function WithIdParam({ name, render }: { name: string; render: (id: string) => React.ReactElement }) {
  const params = useLocalSearchParams<Record<string, string>>();
  const parsed = idSchema.safeParse(params[name]);
  return parsed.success ? render(parsed.data) : <NotFoundScreen />;
}
