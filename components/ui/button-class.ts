// Button looks, usable from server and client components alike.

const variants = {
  primary: "bg-signal text-ink hover:bg-signal-dark border-2 border-ink",
  secondary: "bg-white text-ink border-2 border-ink hover:bg-idle-bg",
  danger: "bg-stop text-white border-2 border-stop hover:opacity-90",
};

export type ButtonVariant = keyof typeof variants;

export function buttonClass(variant: ButtonVariant = "primary", extra = "") {
  return `inline-flex min-h-tap min-w-tap items-center justify-center rounded-lg px-5 text-lg font-bold disabled:opacity-60 ${variants[variant]} ${extra}`;
}
