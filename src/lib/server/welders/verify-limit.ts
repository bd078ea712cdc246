import { RateLimiter } from 'sveltekit-rate-limiter/server';

function perMinute(name: string, fallback: number): number {
	const n = Number(process.env[name]);
	return Number.isFinite(n) && n > 0 ? n : fallback;
}

/** The public card check: anyone may scan, nobody may walk the token space from one address. */
export const verifyLimiter = new RateLimiter({
	IP: [perMinute('VERIFY_LIMIT_IP_PER_MINUTE', 60), 'm']
});
