// The button's class strings as plain data: buttonVariants (cva) builds on
// them, and the root error page uses them without loading cva and cn on every
// page's first load.
export const BUTTON_BASE =
  "inline-flex min-h-11 items-center justify-center gap-2 rounded px-4 py-2 text-base font-semibold transition-colors disabled:cursor-not-allowed disabled:opacity-60";

export const BUTTON_VARIANT = {
  primary: "bg-groove-700 text-white hover:bg-groove-800",
  secondary: "border border-asphalt-300 bg-white text-asphalt-900 hover:bg-asphalt-100",
  ghost: "text-groove-800 hover:bg-groove-50",
  danger: "bg-condition-replace text-white hover:bg-condition-replace/85",
} as const;

export const BUTTON_SIZE = { md: "", sm: "min-h-9 px-3 py-1 text-sm", lg: "min-h-12 px-6 text-lg" } as const;
