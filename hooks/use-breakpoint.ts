import { useWindowDimensions } from 'react-native';
import { breakpoints } from '@/constants/theme';

/** Phone versus wide screen is a width, not a platform: a desktop browser narrowed to 400 px gets the phone layout. */
export function useBreakpoint(): { isWide: boolean; width: number } {
  const { width } = useWindowDimensions();
  return { isWide: width >= breakpoints.wideMinPx, width };
}
