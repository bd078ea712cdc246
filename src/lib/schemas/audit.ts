// The shop-wide audit trail's filters, read from the URL; a value that does not read is dropped.
import { z } from 'zod';

const optional = <T extends z.ZodType>(s: T) => s.optional().catch(undefined);
const DATE = /^\d{4}-\d{2}-\d{2}$/;

export const trailFilterSchema = z.object({
	type: optional(z.string().trim().max(40)),
	action: optional(z.string().trim().max(60)),
	actor: optional(z.string().trim().max(120)),
	object: optional(z.string().trim().max(64)),
	from: optional(z.string().regex(DATE)),
	to: optional(z.string().regex(DATE)),
	page: z.coerce.number().int().min(1).max(100_000).catch(1).default(1)
});

export function readTrailFilters(params: URLSearchParams) {
	const raw: Record<string, string> = {};
	for (const [k, v] of params) if (v.trim() !== '' && !(k in raw)) raw[k] = v;
	return trailFilterSchema.parse(raw);
}
