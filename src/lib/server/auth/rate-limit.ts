import { RateLimiter } from 'sveltekit-rate-limiter/server';

function perMinute(name: string, fallback: number): number {
	const n = Number(process.env[name]);
	return Number.isFinite(n) && n > 0 ? n : fallback;
}

/**
 * Sign-in attempts: per e-mail (guessing one account's password) and per address (spraying many
 * accounts). Every attempt counts, successful or not.
 */
export const signInLimiter = new RateLimiter<string>({
	IP: [perMinute('SIGNIN_LIMIT_IP_PER_MINUTE', 30), 'm'],
	plugins: [{ rate: [10, '15m'], hash: (_event, email) => `email:${email}` }]
});

/** Invite acceptance, sign-up and sign-in links: cheap to ask for, so capped per address. */
export const formLimiter = new RateLimiter({
	IP: [perMinute('FORM_LIMIT_IP_PER_MINUTE', 30), 'm']
});
