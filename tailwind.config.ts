import type { Config } from 'tailwindcss';

// Boothwright's own tokens: a deep "lacquer green" brand, warm neutrals like sanded
// maple, and verdict colours that are always paired with words on screen.
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      // Above a small laptop's 1024 px the navigation is a sidebar; at 1024 px and below it folds
      // into a menu button, so wide tables keep the whole width.
      screens: {
        sidebar: '1025px',
      },
      fontFamily: {
        sans: ['"Work Sans"', 'system-ui', 'sans-serif'],
      },
      colors: {
        lacquer: {
          50: '#eef7f4',
          100: '#d5ece4',
          200: '#a9d7c8',
          300: '#74bca6',
          400: '#449c84',
          500: '#2a7f69',
          600: '#1f6655',
          700: '#1b5246',
          800: '#17423a',
          900: '#123630',
        },
        maple: {
          50: '#faf8f4',
          100: '#f3eee5',
          200: '#e6dccb',
          300: '#d2c2a6',
          400: '#b49d78',
          500: '#95805c',
          600: '#776548',
          700: '#5c4e39',
          800: '#3f362a',
          900: '#2a241c',
        },
        verdict: {
          go: '#1c7c3c',
          caution: '#a35a00',
          stop: '#b4232a',
        },
      },
      spacing: {
        touch: '2.75rem',
      },
      minHeight: {
        touch: '2.75rem',
      },
      minWidth: {
        touch: '2.75rem',
      },
      borderRadius: {
        panel: '0.625rem',
      },
    },
  },
} satisfies Config;
