import { createTheme } from '@mui/material/styles';

/**
 * Thermbay's own look: a deep leaf green for primary actions, a warm amber for highlights
 * (heat), on a faintly warm paper background. Colours are used only through these tokens.
 */
const leafGreen = { light: '#4f8a63', main: '#1f5a3a', dark: '#123a25', contrastText: '#ffffff' };
const warmAmber = { light: '#f7cf7a', main: '#e09b1f', dark: '#a86b00', contrastText: '#1d1300' };

export const theme = createTheme({
  palette: {
    mode: 'light',
    primary: leafGreen,
    secondary: warmAmber,
    error: { main: '#b3261e' },
    // dark enough for text on white (about 5.8:1), as outlined chips and warning text need
    warning: { main: '#9a5400' },
    info: { main: '#2c6d8f' },
    success: { main: '#2e7d32' },
    background: { default: '#f6f5f0', paper: '#ffffff' },
    text: { primary: '#1c2420', secondary: '#4a5650' },
    divider: 'rgba(28, 36, 32, 0.12)',
  },
  shape: { borderRadius: 8 },
  typography: {
    fontFamily: 'Roboto, "Helvetica Neue", Arial, sans-serif',
    h1: { fontSize: '2rem', fontWeight: 500 },
    h2: { fontSize: '1.5rem', fontWeight: 500 },
    h3: { fontSize: '1.2rem', fontWeight: 500 },
    h4: { fontSize: '1.05rem', fontWeight: 500 },
    button: { textTransform: 'none', fontWeight: 500 },
  },
  components: {
    MuiAppBar: {
      defaultProps: { elevation: 0, color: 'primary' },
    },
    MuiButton: {
      defaultProps: { disableElevation: true },
    },
    MuiTextField: {
      defaultProps: { size: 'small', fullWidth: true },
    },
    MuiFormControl: {
      defaultProps: { size: 'small' },
    },
    MuiPaper: {
      defaultProps: { variant: 'outlined' },
    },
    MuiLink: {
      defaultProps: { underline: 'hover' },
    },
    // On a phone a wide table scrolls inside its card, its first column (the row's name) fixed.
    MuiTable: {
      styleOverrides: {
        root: ({ theme }) => ({
          [theme.breakpoints.down('md')]: {
            display: 'block',
            overflowX: 'auto',
            maxWidth: '100%',
            '& tr > :first-of-type': {
              position: 'sticky',
              left: 0,
              zIndex: 1,
              backgroundColor: theme.palette.background.paper,
            },
          },
        }),
      },
    },
    // Print: the page's content only, without the app's bar and buttons.
    MuiCssBaseline: {
      styleOverrides: {
        '@media print': {
          '.MuiAppBar-root, .no-print, button': { display: 'none !important' },
          body: { backgroundColor: '#ffffff' },
          '.MuiTable-root': { display: 'table', overflow: 'visible' },
        },
        // long words (reference ids, covering names) wrap instead of widening the page
        body: { overflowWrap: 'break-word' },
      },
    },
  },
});
