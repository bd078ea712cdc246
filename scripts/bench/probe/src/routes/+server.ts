import { json, type RequestHandler } from '@sveltejs/kit';

// What the app's health route answers, with no hooks and no app around it.
export const GET: RequestHandler = () =>
	json({ ok: true }, { headers: { 'Cache-Control': 'no-store' } });
