import type { ReactNode } from 'react';

/**
 * A page whose `head` (the title block) is printed at the top of every paper page, as a calc pad
 * carries its title block on each sheet: a layout table, since a table's head is the one thing
 * browsers repeat on every printed page. On screen it is plain blocks (styles/print.css).
 */
export function PrintPages({ head, children }: { head: ReactNode; children: ReactNode }) {
  return (
    <table role="presentation" className="print-pages">
      <thead>
        <tr>
          <td>{head}</td>
        </tr>
      </thead>
      <tbody>
        <tr>
          <td>{children}</td>
        </tr>
      </tbody>
    </table>
  );
}
