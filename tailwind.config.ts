import type { Config } from 'tailwindcss';

// Kettlewright's own palette: deep cellar green for structure, brass for action,
// plain high-contrast neutrals for numbers read across a wet brewhouse.
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: { 900: '#111816', 700: '#2d3a36', 500: '#55655f', 300: '#9aa8a2' },
        mist: { 50: '#f6f8f6', 100: '#eaf0ec', 200: '#d5e0d9', 300: '#b8c8be' },
        cellar: { 900: '#0c231e', 800: '#12312b', 700: '#1b4a40', 600: '#256356', 100: '#dcebe5' },
        brass: { 600: '#b8860f', 500: '#d9a21b', 400: '#e9b949', 100: '#fbf0d0' },
        ember: { 700: '#9b1c1c', 600: '#c22a2a', 100: '#fde4e4' },
        sky: { 700: '#1f5f99', 100: '#dcebf8' },
      },
      fontFamily: {
        sans: ['Inter', 'system-ui', 'sans-serif'],
      },
      fontSize: {
        reading: ['2.5rem', { lineHeight: '1.1', fontWeight: '600' }],
      },
      minHeight: { touch: '44px' },
      minWidth: { touch: '44px' },
    },
  },
  plugins: [],
} satisfies Config;
