import type { Config } from 'tailwindcss';

// Tailwind 4 reads its theme from CSS (web/src/styles.css, `@config` points here);
// this file holds the design tokens that both the CSS and the tests read.
export default {
  content: ['./web/index.html', './web/src/**/*.{ts,tsx}'],
  // Dark mode is the `dark` variant in web/src/styles.css: the .dark class the theme switch sets on <html>.
  theme: {
    extend: {
      fontFamily: {
        sans: ['Inter', 'ui-sans-serif', 'system-ui', 'sans-serif'],
        mono: ['"JetBrains Mono"', 'ui-monospace', 'monospace'],
      },
    },
  },
} satisfies Config;
