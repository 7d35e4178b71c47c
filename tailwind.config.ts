import type { Config } from 'tailwindcss';

// Tallyforge's own palette: petrol "forge" blue, brass accent, warm paper; status colours
// chosen to stay apart for common colour-vision deficiencies (always paired with words and icons).
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './lib/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: '#182229', soft: '#3b4852', faint: '#6b7780' },
        paper: { DEFAULT: '#f5f2eb', card: '#fffdf8', line: '#ddd6c8', deep: '#ebe5d8' },
        forge: { DEFAULT: '#1f5a70', dark: '#163f4f', light: '#d9e8ee' },
        brass: { DEFAULT: '#c28a2c', dark: '#8f6419', light: '#f4e6c8' },
        ok: { DEFAULT: '#2f7d57', light: '#dcefe4' },
        caution: { DEFAULT: '#b86e0c', light: '#fbe9cc' },
        fault: { DEFAULT: '#b2392b', light: '#f6dcd7' },
      },
      fontFamily: {
        sans: ['var(--font-sans)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-mono)', 'ui-monospace', 'monospace'],
      },
    },
  },
};

export default config;
