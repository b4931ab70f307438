import { createTheme } from '@mui/material/styles';

/**
 * Wiretrail's own look: deep slate-teal with a copper accent. The dark scheme is for lofts and cupboards,
 * the light one for daylight; both keep body text at a contrast well above WCAG AA.
 */
export const theme = createTheme({
  cssVariables: { colorSchemeSelector: 'data-wt-scheme' },
  colorSchemes: {
    light: {
      palette: {
        primary: { main: '#1d4b55', light: '#3f6f79', dark: '#11343c', contrastText: '#ffffff' },
        secondary: { main: '#a8592a', light: '#c47a3d', dark: '#7d3f1b', contrastText: '#ffffff' },
        background: { default: '#f3f6f6', paper: '#ffffff' },
        text: { primary: '#14262b', secondary: '#44585d' },
        success: { main: '#2e7d4f' },
        error: { main: '#b3261e' },
        warning: { main: '#9a5b00' },
        // Darker than the library's blue, so small text in an outlined chip reads at 4.5:1 or better (WCAG 1.4.3).
        info: { main: '#1f5f8b' },
      },
    },
    dark: {
      palette: {
        primary: { main: '#7fc1cc', light: '#a6d6de', dark: '#4e98a4', contrastText: '#0b1a1d' },
        secondary: { main: '#e0a270', light: '#ecbf9a', dark: '#c47a3d', contrastText: '#1c0f05' },
        background: { default: '#0d181b', paper: '#142428' },
        text: { primary: '#e7efef', secondary: '#a9bcbf' },
        success: { main: '#6cc48f' },
        error: { main: '#f2857c' },
        warning: { main: '#f0b95a' },
        info: { main: '#82c3ec' },
      },
    },
  },
  typography: {
    fontFamily: 'Roboto, system-ui, sans-serif',
    h1: { fontSize: '1.75rem', fontWeight: 500 },
    h2: { fontSize: '1.375rem', fontWeight: 500 },
    h3: { fontSize: '1.125rem', fontWeight: 500 },
    button: { textTransform: 'none', fontWeight: 500, fontSize: '1rem' },
  },
  shape: { borderRadius: 10 },
  components: {
    // Gloved fingers: nothing tappable smaller than 48 px.
    MuiButton: { defaultProps: { disableElevation: true }, styleOverrides: { root: { minHeight: 48, paddingInline: 20 } } },
    MuiIconButton: { styleOverrides: { root: { minWidth: 48, minHeight: 48 } } },
    MuiBottomNavigation: { styleOverrides: { root: { height: 68 } } },
    MuiBottomNavigationAction: { styleOverrides: { label: { fontSize: '0.875rem', '&.Mui-selected': { fontSize: '0.875rem' } } } },
    MuiListItemButton: { styleOverrides: { root: { minHeight: 48 } } },
    // A switch or a check box is tapped by its whole label, which is as tall as a button.
    MuiFormControlLabel: { styleOverrides: { root: { minHeight: 48 } } },
    MuiTextField: { defaultProps: { fullWidth: true } },
    // Right-aligned cells hold figures: "-£208.68" must not break after its sign.
    MuiTableCell: { styleOverrides: { alignRight: { whiteSpace: 'nowrap' } } },
    // The library lets the pager scroll sideways on a narrow screen, a region a keyboard cannot reach: it wraps instead.
    MuiTablePagination: { styleOverrides: { root: { overflow: 'visible' }, toolbar: { flexWrap: 'wrap' } } },
    // In sunlight a faint outline disappears: field borders and the chosen option of a toggle must stand out.
    MuiOutlinedInput: {
      styleOverrides: {
        notchedOutline: ({ theme }) => ({ borderColor: '#7a8a8e', ...theme.applyStyles('dark', { borderColor: '#7f9296' }) }),
      },
    },
    MuiToggleButton: {
      styleOverrides: {
        root: ({ theme }) => ({
          minHeight: 48,
          textTransform: 'none',
          fontSize: '0.95rem',
          color: theme.vars.palette.text.primary,
          borderColor: '#7a8a8e',
          '&.Mui-selected, &.Mui-selected:hover': {
            backgroundColor: theme.vars.palette.primary.main,
            color: theme.vars.palette.primary.contrastText,
            fontWeight: 500,
          },
          ...theme.applyStyles('dark', { borderColor: '#7f9296' }),
        }),
      },
    },
  },
});
