import { RateLimiter } from 'sveltekit-rate-limiter/server';
import { DatabaseRateStore } from './rate-store';

function perMinute(name: string, fallback: number): number {
	const n = Number(process.env[name]);
	return Number.isFinite(n) && n > 0 ? n : fallback;
}

// Both limits are kept in the database, so they hold across server processes: a sign-in or a
// form post is worth the one short write a hit costs.

/** Sign-in attempts per address (spraying many accounts); per e-mail see failed-sign-ins.ts. */
export const signInLimiter = new RateLimiter({
	IP: [perMinute('SIGNIN_LIMIT_IP_PER_MINUTE', 30), 'm'],
	store: new DatabaseRateStore('signin')
});

/** Invite acceptance, sign-up and sign-in links: cheap to ask for, so capped per address. */
export const formLimiter = new RateLimiter({
	IP: [perMinute('FORM_LIMIT_IP_PER_MINUTE', 30), 'm'],
	store: new DatabaseRateStore('form')
});
