import { useWindowDimensions } from 'react-native';
import { breakpoints } from '@/constants/theme';

/** Named layout sizes: `wide` from 900 px (side navigation, side-by-side panes), else phone layout. */
export function useBreakpoints() {
  const { width } = useWindowDimensions();
  return { width, wide: width >= breakpoints.wide, desk: width >= breakpoints.desk };
}
