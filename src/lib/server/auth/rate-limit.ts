import { RateLimiter } from 'sveltekit-rate-limiter/server';
import { perMinute } from '../address-caps';

/** Sign-in attempts per address (spraying many accounts); per e-mail see failed-sign-ins.ts. */
export const signInLimiter = new RateLimiter({
	IP: [perMinute('SIGNIN_LIMIT_IP_PER_MINUTE', 30, { liftableInTests: true }), 'm']
});

/** Invite acceptance, sign-up and sign-in links: cheap to ask for, so capped per address. */
export const formLimiter = new RateLimiter({
	IP: [perMinute('FORM_LIMIT_IP_PER_MINUTE', 30, { liftableInTests: true }), 'm']
});
