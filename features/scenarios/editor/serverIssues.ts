import type { FieldIssue } from '@/features/api/ApiError';

/** The server's reasons for refusing a scenario, by where they belong on the page. */
export type ScenarioIssues = {
  name: string[];
  notes: string[];
  yearsPerStep: string[];
  startCover: string[];
  phases: Record<number, string[]>;
  other: string[];
};

const sentence = (message: string): string => message.charAt(0).toUpperCase() + message.slice(1);

/** Sorts `details.issues` paths ("phases.1.matrix.2", "name", …) to the field or phase they name. */
export function groupScenarioIssues(issues: readonly FieldIssue[]): ScenarioIssues {
  const out: ScenarioIssues = { name: [], notes: [], yearsPerStep: [], startCover: [], phases: {}, other: [] };
  for (const { path, message } of issues) {
    const [head, index] = path.split('.');
    const text = sentence(message);
    if (head === 'phases' && index !== undefined && /^\d+$/.test(index)) {
      const n = Number(index);
      out.phases[n] = [...(out.phases[n] ?? []), text];
    } else if (head === 'name' || head === 'notes' || head === 'yearsPerStep' || head === 'startCover') {
      out[head].push(text);
    } else {
      out.other.push(text);
    }
  }
  return out;
}
