// A compiled data book as the job page lists it (types only; shared by server and browser).
export interface DataBookRow {
	id: number;
	token: string;
	madeAt: string;
	madeBy: string;
	files: number;
	manifestDigest: string;
}
