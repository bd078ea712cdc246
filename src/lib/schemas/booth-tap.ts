import { z } from 'zod';

/** A continuity tap sent from the phone's queue: the id the phone made and when it was made. */
export const boothTapSchema = z.object({
	id: z.uuid('The tap id must be a UUID.'),
	madeAt: z.iso.datetime({ offset: true, message: 'madeAt must be an ISO date and time.' }),
	/** The member key the phone queued it under (see member-key.ts); another person's waits. */
	member: z.string().max(64).optional()
});

export type BoothTapInput = z.infer<typeof boothTapSchema>;
