import { themeQuartz } from "ag-grid-community";

/**
 * Filmsheet's grid look: the app's colour roles (CSS variables that switch with the theme), its
 * font and a dense row for long schedules. Colours stay variables, so light and dark need no
 * second theme.
 */
export const gridTheme = themeQuartz.withParams({
  accentColor: "var(--fs-accent)",
  backgroundColor: "var(--fs-surface)",
  foregroundColor: "var(--fs-ink)",
  chromeBackgroundColor: "var(--fs-sunken)",
  headerBackgroundColor: "var(--fs-sunken)",
  borderColor: "var(--fs-line)",
  oddRowBackgroundColor: "color-mix(in srgb, var(--fs-sunken) 35%, transparent)",
  selectedRowBackgroundColor: "var(--fs-accent-soft)",
  pinnedRowBackgroundColor: "var(--fs-accent-soft)",
  pinnedRowFontWeight: 600,
  fontFamily: "var(--font-inter), ui-sans-serif, system-ui, sans-serif",
  fontSize: 13,
  headerFontSize: 12,
  headerFontWeight: 600,
  rowHeight: 32,
  // Two lines of heading text ("Length along the wind (m)") without measuring every header.
  headerHeight: 48,
  spacing: 6,
  wrapperBorderRadius: 12,
  browserColorScheme: "inherit",
});
