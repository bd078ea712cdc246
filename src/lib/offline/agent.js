// @ts-check
// The offline agent of signed-in pages, as one small classic script (AppShell.svelte links it):
// registers the service worker (offline copies are per person), tells it to send queued taps
// when the connection is back, and offers a reload once a new deployment's worker has taken over
// a page the old one served (or waits to). A plain script, not a component, so that pages without
// JavaScript of their own (`csr = false`, the welder's booth list) still get it without carrying
// the framework; Vite emits it as it is (`?url`), hence JavaScript with checked JSDoc types.
(() => {
	if (!('serviceWorker' in navigator)) return;
	/** @type {Window & { beadlineAgent?: boolean }} */
	const win = window;
	// Client-side navigation can render the shell's <script> again: one agent a document.
	if (win.beadlineAgent) return;
	win.beadlineAgent = true;
	const sw = navigator.serviceWorker;
	const script = document.currentScript;
	// In development Kit serves the worker as an ES module.
	const type = script?.dataset.dev === 'true' ? 'module' : 'classic';
	const hadController = !!sw.controller;
	/** @type {ServiceWorker | null} */
	let waiting = null;
	/** @type {ServiceWorkerRegistration | null} */
	let registration = null;
	// The first worker claiming a page is no update; any change after that one is.
	let controller = sw.controller;

	/**
	 * Asks the controlling worker when it replaced an older deployment's (null: it did not).
	 * @param {ServiceWorker} worker
	 * @returns {Promise<number | null>}
	 */
	function replacedAt(worker) {
		return new Promise((resolve) => {
			const channel = new MessageChannel();
			channel.port1.onmessage = (e) => resolve(e.data?.replacedAt ?? null);
			worker.postMessage({ type: 'version' }, [channel.port2]);
		});
	}

	function reload() {
		if (!waiting) return location.reload();
		// A worker that waits moves in first, so the reload is served by the new deployment.
		sw.addEventListener('controllerchange', () => location.reload(), { once: true });
		waiting.postMessage({ type: 'skip-waiting' });
	}

	/** The "updated" prompt, once. The classes are the app's own (Tailwind reads this file). */
	function offerReload() {
		if (document.querySelector('[data-testid="app-updated"]')) return;
		const box = document.createElement('div');
		box.className =
			'fixed right-4 bottom-4 left-4 z-50 mx-auto flex max-w-md items-center gap-4 rounded-lg border-4 border-ink-900 bg-white p-4 shadow-lg';
		box.setAttribute('role', 'status');
		box.dataset.testid = 'app-updated';
		const text = document.createElement('p');
		text.className = 'flex-1 font-bold';
		text.textContent = 'Beadline was updated.';
		const button = document.createElement('button');
		button.type = 'button';
		button.className = 'min-h-touch rounded-md border-2 border-ink-900 bg-arc-400 px-4 font-bold';
		button.textContent = 'Reload';
		button.addEventListener('click', reload);
		box.append(text, button);
		document.body.append(box);
	}

	sw.addEventListener('controllerchange', () => {
		if (controller) offerReload();
		controller = sw.controller;
	});
	addEventListener('online', () => sw.controller?.postMessage({ type: 'flush' }));
	// The browser looks for a new worker when a page loads. An app brought back from the
	// background loads none: look then too, so coming back to a page kept open is a visit.
	document.addEventListener('visibilitychange', () => {
		if (document.visibilityState === 'visible') registration?.update().catch(() => undefined);
	});
	sw.register('/service-worker.js', { type })
		.then(async (reg) => {
			registration = reg;
			if (reg.waiting && sw.controller) {
				waiting = reg.waiting;
				offerReload();
			}
			// The new worker may have taken over before this page's script ran (no event to see
			// then): it did if it replaced the old deployment after this page was asked for.
			const at = hadController && sw.controller ? await replacedAt(sw.controller) : null;
			if (at !== null && at > performance.timeOrigin) offerReload();
		})
		.catch(() => {
			// No worker (private mode, an old browser): the app works online as before.
		});
})();
