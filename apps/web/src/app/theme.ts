import { createTheme } from '@mui/material/styles';

/**
 * Jarday's look: glass-jar green, apricot, warm paper. Sizes favour wet or floury fingers on a counter
 * tablet: every button and field is at least 56 px tall and body text is 18 px. Colour pairs were checked
 * against the WCAG 2.2 contrast minimum (4.5:1 for text): primary on paper 6.9:1, text on paper 14:1.
 */
const glass = { main: '#1F5F5B', light: '#4E8B86', dark: '#133F3C', contrastText: '#FFFFFF' };
const apricot = { main: '#C8702A', light: '#E8A466', dark: '#9A531B', contrastText: '#22140A' };

export const theme = createTheme({
  cssVariables: { colorSchemeSelector: 'class' },
  colorSchemes: {
    light: {
      palette: {
        primary: glass,
        secondary: apricot,
        background: { default: '#FBF7F0', paper: '#FFFFFF' },
        text: { primary: '#2B2622', secondary: '#5E564E' },
        divider: 'rgba(43, 38, 34, 0.14)',
        error: { main: '#B3261E' },
        warning: { main: '#8A4B12' },
      },
    },
    // For a dim kitchen at the end of a long day: low glare, the same hues lifted for contrast.
    dark: {
      palette: {
        primary: { main: '#7FC4BC', light: '#A8DAD4', dark: '#4E8B86', contrastText: '#0D2220' },
        secondary: { main: '#E8A466', light: '#F2C597', dark: '#C8702A', contrastText: '#2A1708' },
        background: { default: '#121816', paper: '#1B2220' },
        text: { primary: '#EDE6DC', secondary: '#B5ACA1' },
        divider: 'rgba(237, 230, 220, 0.16)',
        error: { main: '#FFB4AB' },
        warning: { main: '#F2C597' },
      },
    },
  },
  shape: { borderRadius: 14 },
  spacing: 8,
  typography: {
    fontFamily: '"Roboto", system-ui, -apple-system, "Segoe UI", sans-serif',
    h1: { fontSize: '2.25rem', fontWeight: 700, lineHeight: 1.2, letterSpacing: '-0.01em' },
    h2: { fontSize: '1.75rem', fontWeight: 700, lineHeight: 1.25 },
    h3: { fontSize: '1.4rem', fontWeight: 500, lineHeight: 1.3 },
    h4: { fontSize: '1.25rem', fontWeight: 500, lineHeight: 1.35 },
    h5: { fontSize: '1.125rem', fontWeight: 500 },
    h6: { fontSize: '1.125rem', fontWeight: 500 },
    subtitle1: { fontSize: '1.125rem', fontWeight: 500 },
    body1: { fontSize: '1.125rem', lineHeight: 1.55 },
    body2: { fontSize: '1rem', lineHeight: 1.5 },
    button: { fontSize: '1.0625rem', fontWeight: 500, textTransform: 'none', letterSpacing: '0.01em' },
    caption: { fontSize: '0.9375rem' },
  },
  components: {
    MuiCssBaseline: {
      styleOverrides: { body: { fontSize: '1.125rem' } },
    },
    MuiButtonBase: {
      styleOverrides: {
        root: ({ theme }) => ({
          '&.Mui-focusVisible': {
            outline: `3px solid ${(theme.vars ?? theme).palette.secondary.main}`,
            outlineOffset: 2,
          },
        }),
      },
    },
    MuiButton: {
      defaultProps: { disableElevation: true },
      styleOverrides: {
        root: { minHeight: 56, paddingInline: 24, borderRadius: 14, fontSize: '1.0625rem' },
        sizeLarge: { fontSize: '1.125rem' },
      },
    },
    MuiIconButton: { styleOverrides: { root: { minWidth: 56, minHeight: 56 } } },
    MuiToggleButton: { styleOverrides: { root: { minHeight: 56, minWidth: 64, fontSize: '1.0625rem' } } },
    MuiMenuItem: { styleOverrides: { root: { minHeight: 56 } } },
    MuiFormControlLabel: { styleOverrides: { root: { minHeight: 56 } } },
    MuiTextField: { defaultProps: { fullWidth: true } },
    MuiOutlinedInput: {
      styleOverrides: {
        root: ({ theme }) => ({
          minHeight: 56,
          fontSize: '1.125rem',
          '&.Mui-focused .MuiOutlinedInput-notchedOutline': { borderWidth: 3 },
          '&.Mui-focused': { outline: 'none' },
          backgroundColor: (theme.vars ?? theme).palette.background.paper,
        }),
      },
    },
    MuiInputLabel: { styleOverrides: { root: { fontSize: '1.125rem' } } },
    MuiFormHelperText: { styleOverrides: { root: { fontSize: '0.9375rem', marginInline: 4 } } },
    MuiAlert: { styleOverrides: { root: { fontSize: '1rem', alignItems: 'flex-start' } } },
    MuiCard: {
      defaultProps: { variant: 'outlined' },
      styleOverrides: { root: { borderRadius: 18 } },
    },
    MuiAppBar: { defaultProps: { elevation: 0, color: 'primary' } },
    MuiLink: { defaultProps: { underline: 'always' } },
  },
});
