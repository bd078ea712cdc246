// Live findings for the form: asks POST /api/v1/checks ~300 ms after the last change, aborts a
// request the next change made stale, and files each finding under the form field it concerns.
// When the server cannot be reached the weld core runs here instead (the bench may have poor
// signal); the server computes the stored findings again on save either way.
import type { CheckResult, Derived, Finding } from '$lib/weld';
import { formFieldOf } from '$lib/records/checks-body';

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
	request(body: Record<string, unknown>, local: () => CheckResult): void {
		const key = JSON.stringify(body);
		if (key === this.#lastKey) return;
		this.#lastKey = key;
		clearTimeout(this.#timer);
		this.#timer = setTimeout(() => void this.#send(key, local), this.#delay);
	}

	async #send(key: string, local: () => CheckResult): Promise<void> {
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
			if (res.status === 400) this.#show(local(), 'refused');
			else if (data) this.#show(data, 'ready');
			else this.#show(local(), 'local');
		} catch {
			if (controller.signal.aborted || controller !== this.#controller) return;
			this.#show(local(), 'local');
		}
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
