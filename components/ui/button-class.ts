import { cva, type VariantProps } from "class-variance-authority";

// The one look of a button, for <button>s and for links that act as buttons, usable from
// server and client components alike. Tap targets are at least 48 px (min-h-tap) for gloves.

export const buttonVariants = cva("inline-flex items-center justify-center gap-2 border-2 font-bold disabled:opacity-60", {
  variants: {
    variant: {
      primary: "border-deck bg-deck text-white hover:bg-deck-light",
      secondary: "border-ink bg-white text-ink hover:bg-idle-bg",
      danger: "border-stop bg-stop text-white hover:opacity-90",
      /** A harmful action offered beside others (tag out): red words on white. */
      "danger-outline": "border-stop bg-white text-stop hover:bg-stop-bg",
      /** On the dark app bar. */
      "on-dark": "border-white bg-transparent text-white hover:bg-deck-light",
    },
    size: {
      normal: "min-h-tap min-w-tap rounded-lg px-5 text-lg",
      /** The one main action of a screen (start a check). */
      large: "min-h-16 rounded-xl px-5 text-xl",
      small: "min-h-tap rounded-lg px-3 text-base",
    },
  },
  defaultVariants: { variant: "primary", size: "normal" },
});

export type ButtonVariant = NonNullable<VariantProps<typeof buttonVariants>["variant"]>;
export type ButtonSize = NonNullable<VariantProps<typeof buttonVariants>["size"]>;

/**
 * The classes of a button, with extra classes (layout: width, alignment) after them.
 * @example buttonClass("secondary", "w-full") // "inline-flex … border-ink bg-white … w-full"
 */
export function buttonClass(variant: ButtonVariant = "primary", extra = "", size: ButtonSize = "normal"): string {
  return buttonVariants({ variant, size, className: extra });
}
