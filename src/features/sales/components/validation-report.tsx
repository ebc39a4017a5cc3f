import type { SalesValidation } from '@shared/contracts/sales';
import { StatusMessage } from '../../../components/ui/status-message';
import { formatDay } from '../../../lib/format';

/** What the check of the whole file found: counts, unknown SKUs, and each bad row with its line. */
export function ValidationReport({ validation }: { validation: SalesValidation }) {
  const v = validation;
  const period = v.firstDay && v.lastDay ? `, sold ${formatDay(v.firstDay)} – ${formatDay(v.lastDay)}` : '';
  return (
    <div className="flex flex-col gap-3">
      {v.badRowCount === 0 ? (
        <StatusMessage tone="ok" title={`All ${v.rowCount.toLocaleString()} rows can be imported${period}.`} />
      ) : (
        <StatusMessage tone="warning" title={`${v.badRowCount.toLocaleString()} of ${v.rowCount.toLocaleString()} rows cannot be imported`}>
          {v.goodRowCount.toLocaleString()} rows are fine{period}. Fix the file and choose it again, or import the good rows and skip these.
        </StatusMessage>
      )}
      {v.unknownSkus.length > 0 && (
        <div>
          <h4 className="font-semibold text-ink">SKUs no variant has</h4>
          <p className="text-sm text-ink-soft">Add these SKUs to the products’ variants first, or skip their rows.</p>
          <ul className="mt-1 flex flex-wrap gap-1.5">
            {v.unknownSkus.slice(0, 30).map((u) => (
              <li key={u.sku} className="rounded-full border border-ochre/50 bg-ochre/10 px-2.5 py-0.5 text-sm">
                <span className="font-semibold">{u.sku}</span> · {u.rows} row{u.rows === 1 ? '' : 's'}, first on line {u.firstLine}
              </li>
            ))}
          </ul>
        </div>
      )}
      {v.badRows.length > 0 && (
        <div className="max-h-72 overflow-y-auto rounded-md border border-sand" tabIndex={0} aria-label="Rows that cannot be imported">
          <table className="w-full text-left text-sm">
            <thead className="sticky top-0 bg-paper">
              <tr className="text-ink-soft">
                <th scope="col" className="px-3 py-2 font-semibold">Line</th>
                <th scope="col" className="px-3 py-2 font-semibold">What is wrong</th>
              </tr>
            </thead>
            <tbody>
              {v.badRows.map((row) => (
                <tr key={row.line} className="border-t border-sand align-top">
                  <td className="px-3 py-1.5 tabular-nums">{row.line}</td>
                  <td className="px-3 py-1.5">{row.reasons.join('; ')}</td>
                </tr>
              ))}
            </tbody>
          </table>
          {v.badRowCount > v.badRows.length && <p className="px-3 py-2 text-sm text-ink-soft">…and {(v.badRowCount - v.badRows.length).toLocaleString()} more rows.</p>}
        </div>
      )}
    </div>
  );
}
