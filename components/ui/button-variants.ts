// Kept apart from button.tsx (a client module) so server components can style links as buttons.
import { cva } from "class-variance-authority";

export const buttonVariants = cva(
  "inline-flex min-h-11 items-center justify-center gap-2 rounded px-4 py-2 text-base font-semibold transition-colors disabled:cursor-not-allowed disabled:opacity-60",
  {
    variants: {
      variant: {
        primary: "bg-groove-700 text-white hover:bg-groove-800",
        secondary: "border border-asphalt-300 bg-white text-asphalt-900 hover:bg-asphalt-100",
        ghost: "text-groove-800 hover:bg-groove-50",
        danger: "bg-condition-replace text-white hover:bg-condition-replace/85",
      },
      size: { md: "", sm: "min-h-9 px-3 py-1 text-sm", lg: "min-h-12 px-6 text-lg" },
    },
    defaultVariants: { variant: "primary", size: "md" },
  },
);
