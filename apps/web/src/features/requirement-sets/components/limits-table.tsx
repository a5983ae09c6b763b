import { REQUIREMENT_FIELDS } from '@polecourt/contracts';

import { REQUIREMENT_FIELD_INFO } from '@/lib/requirement-fields';

import { limitText } from './limit-text';

/** A revision's limits and settings, read only. */
export function LimitsTable({ requirements }: { requirements: Record<string, number> }) {
  const present = REQUIREMENT_FIELDS.filter((f) => requirements[f] !== undefined);
  return (
    <table className="w-full text-left text-sm tabular-nums">
      <caption className="sr-only">Limits and settings</caption>
      <tbody>
        {present.map((f) => (
          <tr key={f} className="border-b border-rule last:border-b-0">
            <th scope="row" className="py-1.5 pr-4 font-medium">
              {REQUIREMENT_FIELD_INFO[f].label}
              {REQUIREMENT_FIELD_INFO[f].kind === 'setting' && <span className="font-normal text-ink-muted"> (setting)</span>}
            </th>
            <td className="py-1.5">{limitText(f, requirements[f])}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
