// Kept apart from button.tsx (a client module) so server components can style links as buttons.
import { cva } from "class-variance-authority";
import { BUTTON_BASE, BUTTON_SIZE, BUTTON_VARIANT } from "./button-classes";

export const buttonVariants = cva(BUTTON_BASE, {
  variants: { variant: BUTTON_VARIANT, size: BUTTON_SIZE },
  defaultVariants: { variant: "primary", size: "md" },
});
