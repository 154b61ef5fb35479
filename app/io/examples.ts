/**
 * Example cases shipped in public/examples/: index.json lists them, each a case file the command line runs as it is
 * (`npx tenuis run public/examples/FILE`) plus, when it was made from a preset, that preset's name and parameters, so
 * the set-up form can start from the same values.
 */
export interface ExampleEntry {
  readonly id: string;
  readonly title: string;
  readonly scenario: string;
  readonly file: string;
  readonly preset?: string;
  readonly parameters?: Readonly<Record<string, string>>;
}

const BASE = `${import.meta.env.BASE_URL}examples/`;

export async function fetchExamples(): Promise<ExampleEntry[]> {
  const response = await fetch(`${BASE}index.json`);
  if (!response.ok) throw new Error(`examples/index.json: HTTP ${response.status}`);
  const body = (await response.json()) as { examples?: ExampleEntry[] };
  return body.examples ?? [];
}

export async function fetchExampleCase(e: ExampleEntry): Promise<string> {
  const response = await fetch(`${BASE}${e.file}`);
  if (!response.ok) throw new Error(`examples/${e.file}: HTTP ${response.status}`);
  return response.text();
}
