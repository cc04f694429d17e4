// Tailwind theme extension mirroring the design tokens. The values live once, in the @theme block
// of app/globals.css (which loads this file with `@config`); every entry here is a var(--…)
// reference to one of those tokens, so the config can name them but never disagree with them.
// Tailwind 4 reads this file only because globals.css names it.
import type { Config } from "tailwindcss";

const ref = (token: string) => `var(--${token})`;
const scale = <S extends string | number>(name: string, steps: readonly S[]) =>
  Object.fromEntries(steps.map((s) => [String(s), ref(`color-${name}-${s}`)])) as Record<`${S}`, string>;

/** Token names, grouped the way globals.css groups them. */
export const tokens = {
  colors: {
    white: ref("color-white"),
    black: ref("color-black"),
    plum: scale("plum", [50, 100, 200, 300, 400, 500, 600, 700, 800, 900, 950] as const),
    gold: scale("gold", [50, 100, 200, 300, 400, 500, 600, 700, 800] as const),
    paper: scale("paper", [50, 100, 200, 300] as const),
    info: scale("info", [50, 700] as const),
    success: scale("success", [50, 700] as const),
    warning: scale("warning", [50, 700] as const),
    danger: scale("danger", [50, 600, 700] as const),
    ink: { DEFAULT: ref("color-ink"), muted: ref("color-ink-muted") },
    line: { DEFAULT: ref("color-line"), strong: ref("color-line-strong") },
    canvas: ref("color-canvas"),
    surface: ref("color-surface"),
    brand: { DEFAULT: ref("color-brand"), strong: ref("color-brand-strong") },
    accent: ref("color-accent"),
    focus: { DEFAULT: ref("color-focus"), "on-dark": ref("color-focus-on-dark") },
  },
  fontFamily: { sans: ref("font-sans"), display: ref("font-display") },
  spacing: { tap: ref("spacing-tap"), "tap-lg": ref("spacing-tap-lg"), page: ref("spacing-page") },
  borderRadius: { control: ref("radius-control"), card: ref("radius-card") },
  boxShadow: { card: ref("shadow-card"), pop: ref("shadow-pop") },
} as const;

export default {
  theme: { extend: tokens },
} satisfies Config;
