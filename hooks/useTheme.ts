import { useColorScheme } from 'react-native';
import { fonts, fontSize, palette, radius, spacing, type ThemeColours } from '../constants/theme';

export interface Theme {
  colours: ThemeColours;
  spacing: typeof spacing;
  radius: typeof radius;
  fonts: typeof fonts;
  fontSize: typeof fontSize;
  dark: boolean;
}

export function useTheme(): Theme {
  const dark = useColorScheme() === 'dark';
  return { colours: dark ? palette.dark : palette.light, spacing, radius, fonts, fontSize, dark };
}
