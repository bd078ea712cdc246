// Two balanced columns for the sheet's variables: pure arithmetic, tested on its own.

/**
 * How many of `heights` go in the left and right column of a page with `avail` points: both
 * columns as even as they can be when everything fits, else each filled to the bottom.
 */
export function splitColumns(
	heights: number[],
	avail: number
): { left: number; right: number; height: number } {
	const fill = (from: number) => {
		let h = 0;
		let n = 0;
		while (from + n < heights.length && h + heights[from + n]! <= avail) h += heights[from + n++]!;
		return { n, h };
	};
	const total = heights.reduce((a, b) => a + b, 0);
	let best: { left: number; right: number; height: number } | null = null;
	if (total <= 2 * avail) {
		let left = 0;
		for (let k = 0; k <= heights.length; k++) {
			const right = total - left;
			const height = Math.max(left, right);
			if (left <= avail && right <= avail && (!best || height < best.height))
				best = { left: k, right: heights.length - k, height };
			left += heights[k] ?? 0;
		}
	}
	if (best) return best;
	const l = fill(0);
	const r = fill(l.n);
	return { left: l.n, right: r.n, height: Math.max(l.h, r.h) };
}
