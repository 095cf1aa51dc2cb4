import type { Config } from 'tailwindcss';

/**
 * Clackwater's palette. Every colour the app shows comes from here; components use
 * these names, never hex values. Dark mode reuses the same hues (deep creek slate
 * becomes the page, limestone the ink).
 */
export const palette = {
  creek: {
    DEFAULT: '#1f3a3d',
    50: '#eef3f3',
    100: '#d5e1e2',
    200: '#aac3c5',
    300: '#7fa4a7',
    400: '#4f7b7f',
    500: '#2f5457',
    600: '#27474a',
    700: '#1f3a3d',
    800: '#182e30',
    900: '#112123',
    950: '#0b1617',
  },
  limestone: {
    DEFAULT: '#f4f1ea',
    50: '#fbfaf7',
    100: '#f4f1ea',
    200: '#e8e2d5',
    300: '#d6cdb9',
    400: '#b9ad93',
  },
  clay: {
    DEFAULT: '#b5562b',
    200: '#efc7b2',
    300: '#e0a080',
    400: '#cf7449',
    500: '#b5562b',
    600: '#964522',
    700: '#76361b',
  },
  moss: {
    DEFAULT: '#5f7a3a',
    100: '#e5edd9',
    300: '#a3bb7f',
    400: '#7f9a55',
    500: '#5f7a3a',
    600: '#4b612e',
    700: '#394a23',
  },
  signal: {
    DEFAULT: '#c98a0b',
    100: '#fbf0d6',
    200: '#f3dca0',
    300: '#e6b84a',
    500: '#c98a0b',
    700: '#8a5e06',
    800: '#5e4005',
    900: '#3a2a08',
  },
} as const;

const config: Config = {
  content: ['./app/**/*.{ts,tsx,mdx}', './components/**/*.{ts,tsx}', './content/**/*.mdx'],
  darkMode: 'media',
  theme: {
    extend: {
      colors: palette,
      fontFamily: {
        serif: ['Literata', 'Georgia', 'Cambria', '"Times New Roman"', 'serif'],
        sans: ['system-ui', '-apple-system', '"Segoe UI"', 'Roboto', '"Helvetica Neue"', 'Arial', 'sans-serif'],
      },
      maxWidth: { prose: '42rem' },
    },
  },
};

export default config;
