// A numbering pattern to a number: {seq} or {seq:N} (zero-padded), {process}, {yyyy}.
export function applyPattern(pattern: string, seq: number, process: string, now = new Date()) {
	return pattern
		.replace(/\{seq(?::(\d))?\}/g, (_m, width: string | undefined) =>
			String(seq).padStart(Number(width ?? 1), '0')
		)
		.replace(/\{process\}/g, process)
		.replace(/\{yyyy\}/g, String(now.getUTCFullYear()))
		.slice(0, 40);
}
