import { createTheme, rem, type MantineColorsTuple } from '@mantine/core';

// Built around #1d5c63 (shade 6), lighter shades keep the hue and ease the saturation.
const keenTeal: MantineColorsTuple = [
  '#edf6f7',
  '#d4eaed',
  '#acd8dd',
  '#7dc2ca',
  '#4baeb9',
  '#32868f',
  '#1d5c63',
  '#17494f',
  '#123b3f',
  '#0e2c2f',
];

// Built around #c08a2d (shade 6).
const brass: MantineColorsTuple = [
  '#faf4ea',
  '#f4e8d2',
  '#ecd4ac',
  '#e2bf83',
  '#d8aa5a',
  '#d19b3d',
  '#c08a2d',
  '#9d7125',
  '#7c591d',
  '#5b4115',
];

// Warm greys (a touch of brass in the hue) replace Mantine's cool ones.
const warmGray: MantineColorsTuple = [
  '#fbfaf9',
  '#f5f3f0',
  '#eae6e1',
  '#d9d4ce',
  '#bab3ab',
  '#989086',
  '#797167',
  '#5e5850',
  '#45403a',
  '#322e29',
];

const fontStack = 'Inter, system-ui, -apple-system, "Segoe UI", Roboto, sans-serif';

export const theme = createTheme({
  primaryColor: 'keenTeal',
  primaryShade: 6,
  colors: { keenTeal, brass, gray: warmGray },
  autoContrast: true,
  fontFamily: fontStack,
  headings: { fontFamily: fontStack, fontWeight: '700' },
  defaultRadius: 'md',
  cursorType: 'pointer',
  spacing: { xs: rem(10), sm: rem(14), md: rem(20), lg: rem(28), xl: rem(40) },
  other: { accentColor: 'brass' },
  // Plain objects rather than Component.extend(), so the theme does not pull every component into the first chunk.
  components: {
    Button: { defaultProps: { size: 'md' } },
    ActionIcon: { defaultProps: { size: 'xl', variant: 'subtle' } },
    TextInput: { defaultProps: { size: 'md' } },
    PasswordInput: { defaultProps: { size: 'md' } },
    Select: { defaultProps: { size: 'md' } },
    // A badge is a word or two ("Handed back", "Fri"): a table or a narrow card squeezed them to "Hand…" on a phone.
    Badge: { styles: { root: { minWidth: 'max-content' } } },
    NavLink: { styles: { root: { minHeight: rem(48), borderRadius: 'var(--mantine-radius-md)' } } },
  },
});
