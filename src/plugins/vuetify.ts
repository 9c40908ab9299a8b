import { createVuetify, type ThemeDefinition } from 'vuetify';
import { aliases, mdi } from 'vuetify/iconsets/mdi-svg';
import 'vuetify/styles';
import { appIcons } from './icons';

const BARLOW = "'Barlow', 'Segoe UI', system-ui, sans-serif";

/**
 * Anodised aluminium: cool greys from bar stock to hard-anodised graphite, with a single warm copper accent for
 * what can be acted on. `chassis` is the dark band of the app bar.
 */
const slotwright: ThemeDefinition = {
  dark: false,
  colors: {
    background: '#E8EBEE',
    surface: '#FAFBFC',
    'surface-bright': '#FFFFFF',
    'surface-light': '#DCE0E4',
    'surface-variant': '#2B3036',
    'on-surface-variant': '#E6E9EC',
    'on-surface': '#1E2328',
    'on-background': '#1E2328',
    primary: '#B4581F',
    'primary-darken-1': '#8F4416',
    secondary: '#4A535C',
    'secondary-darken-1': '#353C43',
    chassis: '#2B3036',
    'on-chassis': '#E6E9EC',
    'accent-on-chassis': '#E08A3C',
    muted: '#6B7480',
    error: '#B3261E',
    warning: '#9A5B00',
    info: '#3E6A86',
    success: '#2E7450',
  },
  variables: {
    'font-body': BARLOW,
    'font-heading': BARLOW,
    'border-color': '#1E2328',
    'border-opacity': 0.14,
    'medium-emphasis-opacity': 0.68,
    'hover-opacity': 0.05,
  },
};

const field = { variant: 'outlined', density: 'comfortable', color: 'primary', hideDetails: 'auto' } as const;

export const vuetify = createVuetify({
  theme: { defaultTheme: 'slotwright', themes: { slotwright } },
  icons: { defaultSet: 'mdi', aliases: { ...aliases, ...appIcons }, sets: { mdi } },
  defaults: {
    VAppBar: { color: 'chassis', flat: true, density: 'comfortable' },
    VBtn: { rounded: 'sm', variant: 'flat' },
    VCard: { rounded: 'md', flat: true, border: true },
    VTextField: field,
    VTextarea: { ...field, rows: 3, autoGrow: true },
    VSelect: field,
    VDataTable: { density: 'comfortable', hover: true, itemsPerPage: 25, mobileBreakpoint: 'sm' },
    VDialog: { maxWidth: 520 },
    VAlert: { variant: 'tonal', density: 'comfortable', border: 'start' },
    VChip: { size: 'small', variant: 'tonal', label: true },
    VEmptyState: { size: 64, color: 'muted' },
    VList: { density: 'comfortable' },
    VTabs: { color: 'primary' },
    VTooltip: { location: 'bottom' },
    VProgressLinear: { color: 'primary', indeterminate: true },
  },
});
