/** Shared look of the screens' charts: plain text colours and the font the app ships. */
export const CHART_TEXT = { color: '#1f2329', fontFamily: 'Roboto, sans-serif', fontSize: 12 } as const;
/** Series colours of bar charts that are not tied to a principal axis (ours). */
export const SERIES_COLOURS = ['#2f6f9f', '#c26a1b', '#4b8b3b', '#8e44ad', '#b03a48', '#5d6d7e'] as const;
