import { createTheme } from '@mui/material/styles';

/**
 * Linkloom's own palette: a deep ink-teal for structure (the warp threads) and a warm saffron accent
 * (the weft) for the one thing on a screen that asks for action.
 */
export const brand = {
  ink: '#123F4A',
  inkDark: '#0A2A32',
  inkLight: '#3E6E78',
  thread: '#9FD3D0',
  saffron: '#E8893A',
  saffronDark: '#B9621B',
  paper: '#FBFAF7',
  linen: '#F2EFE8',
} as const;

/** Series colours for charts, starting with the brand pair; distinct in hue and lightness. */
export const chartColors = [brand.ink, brand.saffron, '#4F9A8A', '#A8445A', '#6D63A8', '#B08D1E'];

export const theme = createTheme({
  palette: {
    mode: 'light',
    primary: { main: brand.ink, dark: brand.inkDark, light: brand.inkLight, contrastText: '#FFFFFF' },
    secondary: { main: brand.saffron, dark: brand.saffronDark, contrastText: '#1B1208' },
    error: { main: '#B3261E' },
    warning: { main: '#A15C00' },
    success: { main: '#2E7D4F' },
    background: { default: brand.paper, paper: '#FFFFFF' },
    text: { primary: '#1C2629', secondary: '#4F5F63' },
    divider: 'rgba(18, 63, 74, 0.12)',
  },
  shape: { borderRadius: 10 },
  typography: {
    fontFamily: 'Roboto, system-ui, -apple-system, "Segoe UI", sans-serif',
    h1: { fontSize: '1.75rem', fontWeight: 500, letterSpacing: '-0.01em' },
    h2: { fontSize: '1.4rem', fontWeight: 500 },
    h3: { fontSize: '1.15rem', fontWeight: 500 },
    button: { textTransform: 'none', fontWeight: 500 },
  },
  components: {
    MuiButton: { defaultProps: { disableElevation: true } },
    MuiPaper: { styleOverrides: { outlined: { borderColor: 'rgba(18, 63, 74, 0.14)' } } },
    MuiCard: { defaultProps: { variant: 'outlined' } },
    MuiTableCell: { styleOverrides: { head: { fontWeight: 600, backgroundColor: brand.linen } } },
    MuiTooltip: { defaultProps: { arrow: true } },
  },
});
