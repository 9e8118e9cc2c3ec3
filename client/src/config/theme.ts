import { Anchor, createTheme, type MantineColorsTuple } from '@mantine/core';

// Broodsilk's palette: moss for the brand, amber for what is due, clay for what failed
// or is overdue, warm greys for surfaces. Shade 7 of moss, 8 of amber and 6 of clay
// meet WCAG 2.2 AA (4.5:1) as text on white; the dark scheme fills with shade 6 (white text ≈ 5:1) and uses shades 3–4 for text.
// dark[2] is the dark scheme's dimmed text: 4.6:1 on dark[5], the lightest surface it sits on.
const moss: MantineColorsTuple = ['#eef5f2', '#d5e7e0', '#acd0c2', '#80b7a3', '#5c9f88', '#468a74', '#3a7564', '#2f5d50', '#244a40', '#193630'];
const amber: MantineColorsTuple = ['#fff7e6', '#fdeac2', '#f9d48a', '#f3bc4f', '#eaa622', '#d98e04', '#b57503', '#8a5a00', '#664200', '#432b00'];
const clay: MantineColorsTuple = ['#fbeeec', '#f4d3ce', '#e9aaa1', '#dc8175', '#cd6153', '#b5473a', '#983a2f', '#7a2f26', '#5c231c', '#3e1813'];
const gray: MantineColorsTuple = ['#f7f5f2', '#eeebe6', '#e0dcd5', '#cdc7be', '#b3aca1', '#8c857a', '#6f695f', '#57524b', '#403c37', '#2b2824'];
const dark: MantineColorsTuple = ['#dcd7d0', '#bdb7ae', '#a8a298', '#6b665e', '#4d4943', '#3b3833', '#2e2b27', '#252320', '#1c1b18', '#141311'];

export const theme = createTheme({
  primaryColor: 'moss',
  primaryShade: { light: 7, dark: 6 },
  // Filled buttons pick black or white text by the fill's luminance.
  autoContrast: true,
  colors: { moss, amber, clay, gray, dark },
  fontFamily: 'Inter, system-ui, -apple-system, "Segoe UI", sans-serif',
  headings: { fontFamily: 'Inter, system-ui, sans-serif', fontWeight: '700' },
  defaultRadius: 'md',
  cursorType: 'pointer',
  // Links are underlined, so they differ from the text around them by more than colour (WCAG 1.4.1).
  components: { Anchor: Anchor.extend({ defaultProps: { underline: 'always' } }) },
  other: { tones: { due: 'amber', failed: 'clay', ok: 'moss' } },
});
