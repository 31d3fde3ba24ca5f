import type { Config } from 'tailwindcss';

// Waygrade's look: warm paper, graphite ink, one copper accent. Condition bands have their own
// colours but always travel with a word and a shape (components/ui/band-badge.tsx).
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}', './lib/**/*.{ts,tsx}'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['"Work Sans"', 'ui-sans-serif', 'system-ui', 'sans-serif'],
      },
      colors: {
        paper: { DEFAULT: '#f7f5f0', raised: '#ffffff', sunken: '#eeebe3' },
        ink: { DEFAULT: '#1f2a30', soft: '#46545c', faint: '#5f6b71' },
        line: { DEFAULT: '#d9d4c8', strong: '#b9b2a3' },
        copper: { DEFAULT: '#a4481f', dark: '#7f3513', light: '#f3e2d8' },
        band: {
          true: '#25613f',
          fair: '#4d6a1c',
          worn: '#8a5a00',
          rebuild: '#9d2f22',
          unknown: '#5d6a71',
        },
      },
      fontSize: {
        // Reads at arm's length on a phone in a dim workshop: the base is 17 px.
        base: ['1.0625rem', { lineHeight: '1.6rem' }],
      },
      borderRadius: { card: '0.75rem' },
      minHeight: { touch: '44px' },
      minWidth: { touch: '44px' },
    },
  },
};

export default config;
