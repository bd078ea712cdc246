// Live findings for the form: asks POST /api/v1/checks ~300 ms after the last change, aborts a
// request the next change made stale, and files each finding under the form field it concerns.
// When the server cannot be reached the weld core runs here instead (the bench may have poor
// signal), fetched only then; the server computes the stored findings again on save either way.
import type { CheckResult, Derived, Finding } from '$lib/weld';
import { formFieldOf } from '$lib/records/checks-body';

/** The browser's own checks: the caller loads the weld core lazily (it is most of the bundle). */
export type LocalChecks = () => CheckResult | Promise<CheckResult>;

export type LiveStatus = 'idle' | 'checking' | 'ready' | 'local' | 'refused';

export class LiveChecks {
	findings = $state<Finding[]>([]);
	derived = $state<Derived>({});
	status = $state<LiveStatus>('idle');

	#timer: ReturnType<typeof setTimeout> | undefined;
	#controller: AbortController | undefined;
	#lastKey = '';
	readonly #endpoint: string;
	readonly #delay: number;

	constructor(endpoint = '/api/v1/checks', delay = 300) {
		this.#endpoint = endpoint;
		this.#delay = delay;
	}

	/** Schedules a check of `body`; `local` answers when the server cannot. Same body, no request. */
	request(body: Record<string, unknown>, local: LocalChecks): void {
		const key = JSON.stringify(body);
		if (key === this.#lastKey) return;
		this.#lastKey = key;
		clearTimeout(this.#timer);
		this.#timer = setTimeout(() => void this.#send(key, local), this.#delay);
	}

	async #send(key: string, local: LocalChecks): Promise<void> {
		this.#controller?.abort();
		const controller = new AbortController();
		this.#controller = controller;
		this.status = 'checking';
		try {
			const res = await fetch(this.#endpoint, {
				method: 'POST',
				headers: { 'content-type': 'application/json', accept: 'application/json' },
				body: key,
				signal: controller.signal
			});
			const data = res.ok ? ((await res.json()) as CheckResult) : null;
			if (controller !== this.#controller) return;
			// A 400: the server could not read a value the form can; show the browser's findings.
			if (res.status === 400) await this.#showLocal(controller, local, 'refused');
			else if (data) this.#show(data, 'ready');
			else await this.#showLocal(controller, local, 'local');
		} catch {
			if (controller.signal.aborted || controller !== this.#controller) return;
			await this.#showLocal(controller, local, 'local');
		}
	}

	async #showLocal(controller: AbortController, local: LocalChecks, status: LiveStatus) {
		let result: CheckResult;
		try {
			result = await local();
		} catch {
			// Offline with no copy of the weld core: no findings now; saving checks them anyway.
			if (controller === this.#controller) this.status = 'idle';
			return;
		}
		// A newer change asked again while the weld core loaded: that answer is the one to show.
		if (controller === this.#controller) this.#show(result, status);
	}

	#show(result: CheckResult, status: LiveStatus): void {
		this.findings = result.findings ?? [];
		this.derived = result.derived ?? {};
		this.status = status;
	}

	/** Findings to show beside a form field. */
	forField(name: string): Finding[] {
		return this.findings.filter((f) => formFieldOf(f.field) === name);
	}

	/** Findings that concern no one field the form shows. */
	get general(): Finding[] {
		return this.findings.filter((f) => formFieldOf(f.field) === null);
	}

	get cautions(): number {
		return this.findings.filter((f) => f.status !== 'ok').length;
	}

	destroy(): void {
		clearTimeout(this.#timer);
		this.#controller?.abort();
	}
}
