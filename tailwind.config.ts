import type { Config } from 'tailwindcss';

// Semantic colours only: slate surfaces, one deep-teal brand, amber = deadline near,
// red = missed / unsafe, green = done / safe.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['Inter', 'system-ui', 'sans-serif'],
      },
      colors: {
        brand: {
          50: '#effaf8',
          100: '#d7f1ed',
          600: '#0f766e',
          700: '#115e59',
          800: '#134e4a',
          900: '#0b3b38',
        },
        near: { 100: '#fef3c7', 500: '#f59e0b', 700: '#b45309' },
        missed: { 100: '#fee2e2', 600: '#dc2626', 700: '#b91c1c' },
        safe: { 100: '#dcfce7', 600: '#16a34a', 700: '#15803d' },
      },
      minHeight: { touch: '3rem' },
      minWidth: { touch: '3rem' },
    },
  },
  plugins: [],
};

export default config;
