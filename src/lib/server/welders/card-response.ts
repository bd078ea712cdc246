// Shared by the welder's page and "My qualifications": the card PDF as a download.
import { error, type RequestEvent } from '@sveltejs/kit';
import type { SessionUser } from '../auth/session-user';
import { qualificationCardPdf, type CardSize } from '../pdf/qualification-card';
import { rethrowAsHttp } from '../people/form-errors';
import { localDay } from './dates';
import { welderView } from './read';
import { liveLink, verifyUrl } from './verification';

const SIZES: readonly CardSize[] = ['wallet', 'a4', 'letter'];

/** A file name with nothing a header or a file system could trip on. */
const safe = (s: string) =>
	s
		.normalize('NFKD')
		.replace(/[^A-Za-z0-9]+/g, '-')
		.replace(/^-+|-+$/g, '')
		.slice(0, 60) || 'welder';

export async function cardResponse(event: RequestEvent, user: SessionUser, welderId: number) {
	const size = (event.url.searchParams.get('size') ?? 'wallet') as CardSize;
	if (!SIZES.includes(size)) error(400, { message: 'Pick wallet, a4 or letter.' });
	const today = localDay(new Date(), user.timeZone);
	const welder = await welderView(user.shopId, welderId, today).catch(rethrowAsHttp);
	const { token } = await liveLink(user, welderId, event);
	const bytes = await qualificationCardPdf({
		shopName: user.shopName,
		welder,
		url: verifyUrl(token),
		printedOn: today,
		units: user.unitSystem,
		size
	});
	const name = `qualification-card-${safe(welder.name)}-${safe(welder.stamp)}-${size}.pdf`;
	return new Response(bytes as BodyInit, {
		headers: {
			'Content-Type': 'application/pdf',
			'Content-Disposition': `attachment; filename="${name}"`,
			'Cache-Control': 'private, no-store',
			'X-Content-Type-Options': 'nosniff'
		}
	});
}
