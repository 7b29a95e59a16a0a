import type { MeasureSystem } from '@vatside/dye-kit';
import { Button } from '@vatside/ui/Button';
import { SelectField } from '@vatside/ui/form/SelectField';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { Link } from 'react-router-dom';
import { SystemSwitch } from './SystemSwitch.tsx';
import './print-sheet.css';

export type Paper = 'a4' | 'letter';
const paperNames: Record<Paper, string> = { a4: 'A4', letter: 'US Letter' };

/** The paper a sheet starts on: Letter with US measures, A4 with metric. */
export const paperFor = (system: MeasureSystem): Paper => (system === 'us' ? 'letter' : 'a4');

/** A sheet's card on screen, and its page on the chosen paper in print (print-sheet.css). */
export const printSheetClass = (paper: Paper) =>
  `vs-print-sheet ${paper === 'a4' ? 'vs-paper-a4' : 'vs-paper-letter'} mx-auto space-y-6 rounded-card border border-wool-200 bg-white p-8 shadow-card`;

/** The screen-only bar above a sheet to print: back, paper size, measures, print. */
export function PrintToolbar({
  backTo,
  backLabel,
  paper,
  onPaper,
  system,
  onSystem,
  printLabel,
}: {
  backTo: string;
  backLabel: string;
  paper: Paper;
  onPaper: (paper: Paper) => void;
  system: MeasureSystem;
  onSystem: (system: MeasureSystem) => void;
  printLabel: string;
}) {
  return (
    <div className="vs-print-hide mx-auto flex max-w-4xl flex-wrap items-end gap-4 rounded-card bg-vat-900 p-4 text-wool-50 [--vs-focus:var(--color-marigold-300)]">
      <Link to={backTo} className={`${textLinkClass} gap-1 text-wool-50 hover:text-marigold-300`}>
        <span aria-hidden="true">←</span>
        {backLabel}
      </Link>
      <SelectField
        label="Paper"
        className="w-44"
        value={paper}
        onChange={(event) => onPaper(event.target.value as Paper)}
      >
        {Object.entries(paperNames).map(([value, label]) => (
          <option key={value} value={value}>
            {label}
          </option>
        ))}
      </SelectField>
      <div className="rounded-xl bg-wool-50 text-vat-950">
        <SystemSwitch system={system} onChange={onSystem} />
      </div>
      <Button variant="secondary" className="ml-auto" onClick={() => window.print()}>
        {printLabel}
      </Button>
    </div>
  );
}
