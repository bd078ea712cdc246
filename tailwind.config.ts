import type { Config } from 'tailwindcss';

// Beadline's own palette: a dark "booth" ink, a hot-metal amber for action, and status colours
// picked for contrast on both paper-white and ink backgrounds (gloved, glare, arm's length).
export default {
	content: ['./src/**/*.{html,js,svelte,ts}'],
	theme: {
		extend: {
			colors: {
				ink: {
					50: '#f4f5f7',
					100: '#e6e8ec',
					200: '#c9cdd5',
					300: '#9aa1ae',
					400: '#6b7382',
					500: '#4b5260',
					600: '#353a45',
					700: '#252932',
					800: '#1b1e25',
					900: '#14171c'
				},
				arc: {
					50: '#fff8e6',
					100: '#ffecbf',
					200: '#ffd780',
					300: '#ffc247',
					400: '#ffb020',
					500: '#e89400',
					600: '#b87200',
					700: '#8a5500'
				},
				sound: { 100: '#dcf5e6', 600: '#137a43', 700: '#0e5e33' },
				heed: { 100: '#fff1c2', 600: '#8a6100', 700: '#6b4b00' },
				stop: { 100: '#fde0e0', 600: '#b3261e', 700: '#8c1d17' },
				cool: { 100: '#dbeafe', 600: '#1d5fbf', 700: '#164a96' }
			},
			fontFamily: {
				sans: ['"Atkinson Hyperlegible Next"', 'system-ui', 'sans-serif'],
				mono: ['"Atkinson Hyperlegible Mono"', 'ui-monospace', 'monospace']
			},
			fontSize: {
				// A scale that starts larger than usual: the smallest text is still readable at a booth.
				xs: ['0.8125rem', { lineHeight: '1.15rem' }],
				sm: ['0.9375rem', { lineHeight: '1.35rem' }],
				base: ['1.0625rem', { lineHeight: '1.6rem' }],
				lg: ['1.25rem', { lineHeight: '1.75rem' }],
				xl: ['1.5rem', { lineHeight: '2rem' }],
				'2xl': ['1.875rem', { lineHeight: '2.25rem' }],
				'3xl': ['2.375rem', { lineHeight: '2.75rem' }],
				'4xl': ['3rem', { lineHeight: '1.1' }]
			},
			minHeight: { touch: '3rem' },
			minWidth: { touch: '3rem' }
		}
	}
} satisfies Config;
