// What the wear chart (wear-chart.tsx, with the page) and its plot
// (wear-plot.tsx, loaded after the page) share, without loading the plot.
export type ChartAxis = "date" | "odometer";
/** The hatch pattern of the limit zone, defined once by wear-chart.tsx for the plot and the key. */
export const HATCH_ID = "fourpatch-limit-hatch";
