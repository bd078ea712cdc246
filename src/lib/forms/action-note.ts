// A plain form action's outcome (one without a superform) as a Flash note: the action returns its
// words under one key when it worked and under another when it did not.
import type { FlashNote } from '$lib/components/Flash.svelte';

export function actionNote(
	result: Record<string, unknown> | null | undefined,
	done: string,
	failed: string
): FlashNote | null {
	if (result && done in result) return { tone: 'success', text: String(result[done]) };
	if (result && failed in result) return { tone: 'error', text: String(result[failed]) };
	return null;
}
