import { useWindowDimensions } from 'react-native';
import { WIDE_BREAKPOINT } from '../constants/theme';

/** True on wide screens (≥ 1024 px): side navigation and two panes. */
export function useWideLayout(): boolean {
  return useWindowDimensions().width >= WIDE_BREAKPOINT;
}
