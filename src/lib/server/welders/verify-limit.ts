import { RateLimiter } from 'sveltekit-rate-limiter/server';
import { perMinute } from '../address-caps';

/** The public card check: anyone may scan, nobody may walk the token space from one address. */
export const verifyLimiter = new RateLimiter({
	IP: [perMinute('VERIFY_LIMIT_IP_PER_MINUTE', 60), 'm']
});
