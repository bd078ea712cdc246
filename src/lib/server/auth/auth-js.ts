import SequelizeAdapter from '@auth/sequelize-adapter';
import { SvelteKitAuth } from '@auth/sveltekit';
import Credentials from '@auth/sveltekit/providers/credentials';
import Nodemailer from '@auth/sveltekit/providers/nodemailer';
import { config } from '../config';
import { sequelize } from '../db/sequelize';
import { sendMail } from '../mail/send';
import { signInLinkMail } from '../mail/templates';
import { Account, Session, User, VerificationToken } from '../models';
import { verifyPassword } from './password';
import { authSecret } from './secret';

const SESSION_HOURS = 12;

async function activeMember(email: unknown) {
	if (typeof email !== 'string' || email.length > 254) return null;
	const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
	return user?.active ? user : null;
}

// The config is built per request (function form) so nothing touches the data folder at build time.
export const {
	handle: authHandle,
	signIn: authSignIn,
	signOut: authSignOut
} = SvelteKitAuth(async () => ({
	trustHost: true,
	secret: authSecret(),
	adapter: SequelizeAdapter(sequelize, {
		synchronize: false,
		models: { User, Account, Session, VerificationToken } as never
	}),
	session: { strategy: 'jwt', maxAge: SESSION_HOURS * 3600 },
	pages: { signIn: '/signin', error: '/signin', verifyRequest: '/signin/check-mail' },
	providers: [
		Credentials({
			credentials: { email: {}, password: {} },
			async authorize(credentials) {
				const user = await activeMember(credentials.email);
				const ok = await verifyPassword(String(credentials.password ?? ''), user?.passwordHash);
				if (!user || !ok) return null;
				return { id: user.id, name: user.name, email: user.email };
			}
		}),
		Nodemailer({
			server: config.smtpUrl,
			from: config.mailFrom,
			maxAge: 24 * 3600,
			// Only members get a link; everyone else sees the same "check your mail" page, so the
			// form never tells whether an e-mail has an account.
			async sendVerificationRequest({ identifier, url }) {
				if (await activeMember(identifier))
					await sendMail(signInLinkMail({ to: identifier, link: url }));
			}
		})
	],
	callbacks: {
		async signIn({ user, email }) {
			// Asking for a link always "succeeds" (sendVerificationRequest mails members only), so
			// an unknown address sees the member's page; following the link checks the member.
			if (email?.verificationRequest) return true;
			return !!(await activeMember(user.email));
		},
		async jwt({ token, user }) {
			if (user) {
				const member = await activeMember(user.email);
				token.sub = member?.id;
				token.sv = member?.sessionVersion;
			}
			return token;
		},
		session({ session, token }) {
			return { ...session, uid: token.sub, sv: token.sv };
		}
	}
}));
