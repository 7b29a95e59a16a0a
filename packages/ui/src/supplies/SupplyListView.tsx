import type { SupplyList } from '@vatside/contracts/dye-along-supplies';
import type { ReactNode } from 'react';
import { WarningList } from '../WarningList.tsx';
import {
  acidName,
  dyeMeasure,
  fiberText,
  formatGrams,
  formatMl,
  formatQuantity,
  liquidMeasure,
  type MeasureText,
} from './format.ts';

/** Section headings sit one level under the page's own (h3 by default). */
export type HeadingLevel = 3 | 4;

function Section({
  title,
  level,
  children,
}: {
  title: string;
  level: HeadingLevel;
  children: ReactNode;
}) {
  const Heading = level === 3 ? 'h3' : 'h4';
  return (
    <section aria-label={title} className="space-y-2">
      <Heading className="text-xl font-bold">{title}</Heading>
      {children}
    </section>
  );
}

/** One thing to have ready: its name, the amount large, and what it is for. */
function Item({
  name,
  measure,
  notes = [],
}: {
  name: ReactNode;
  measure?: MeasureText;
  notes?: ReactNode[];
}) {
  return (
    <li className="rounded-xl border border-wool-200 bg-white p-3">
      <p className="font-bold">{name}</p>
      {measure ? (
        <p>
          <span className="text-2xl font-bold">{measure.main}</span>
          {measure.detail ? (
            <span className="block text-vat-800 sm:ml-2 sm:inline">{measure.detail}</span>
          ) : null}
        </p>
      ) : null}
      {notes.map((note, i) => (
        <p key={i} className="text-vat-800">
          {note}
        </p>
      ))}
    </li>
  );
}

const forWhich = (colorways: string[]) =>
  colorways.length > 0 ? `For ${colorways.join(', ')}` : null;

/** The supply list as the server merged it: dyes, acid, yarn, equipment, then the cautions. */
export function SupplyListView({
  supplies,
  level = 3,
}: {
  supplies: SupplyList;
  level?: HeadingLevel;
}) {
  const { system } = supplies;
  return (
    <div className="space-y-6">
      <Section title="Dyes" level={level}>
        {supplies.dyes.length === 0 ? (
          <p>No dyes yet: the recipes are still being written.</p>
        ) : (
          <ul className="space-y-2">
            {supplies.dyes.map((dye) => (
              <Item
                key={dye.key}
                name={
                  dye.kind === 'stock'
                    ? `${dye.name}, ${formatQuantity(dye.stockStrengthPct ?? 0)} % stock solution`
                    : dye.name
                }
                measure={dyeMeasure(dye, system)}
                notes={[
                  forWhich(dye.colorways),
                  dye.mix
                    ? `Mix a ${formatMl(dye.mix.volumeMl)} jar: ${formatQuantity(dye.mix.powderG)} g of dye${dye.fromPowder ? ' powder (dust mask on)' : ''} made up to ${formatMl(dye.mix.volumeMl)} with water.`
                    : null,
                ].filter(Boolean)}
              />
            ))}
          </ul>
        )}
      </Section>
      <Section title="Acid" level={level}>
        <ul className="space-y-2">
          {supplies.acid.map((acid) => (
            <Item
              key={`${acid.acid}-${acid.acidStrengthPct ?? ''}`}
              name={acidName(acid.acid, acid.acidStrengthPct)}
              measure={liquidMeasure(acid.amountMl, acid.household, system)}
              notes={[forWhich(acid.colorways), ...acid.rules]}
            />
          ))}
        </ul>
      </Section>
      <Section title="Yarn" level={level}>
        <ul className="space-y-2">
          {supplies.yarn.map((yarn) => (
            <Item
              key={yarn.baseId ?? yarn.name}
              name={yarn.name}
              measure={{
                main: `${yarn.skeins} × ${formatGrams(yarn.skeinWeightG, system)}`,
                detail: yarn.skeins > 1 ? `${formatGrams(yarn.totalWeightG, system)} in all` : null,
              }}
              notes={[
                yarn.fiberContent.length > 0 ? fiberText(yarn.fiberContent) : null,
                yarn.superwash === true
                  ? 'Superwash: takes dye fast, so add it slowly and stir gently.'
                  : yarn.superwash === false
                    ? 'Not superwash: it felts if shocked or stirred hard.'
                    : null,
                forWhich(yarn.colorways),
              ].filter(Boolean)}
            />
          ))}
        </ul>
      </Section>
      <Section title="Equipment" level={level}>
        <ul className="space-y-2">
          {supplies.equipment.map((tool) => (
            <Item key={tool.key} name={tool.item} notes={[tool.detail]} />
          ))}
        </ul>
      </Section>
      <WarningList
        title="Worth knowing before you dye"
        warnings={supplies.warnings.map((w) => ({ ...w, message: `${w.colorway}: ${w.message}` }))}
      />
      <SupplyCautions cautions={supplies.cautions} safetyNote={supplies.safetyNote} level={level} />
    </div>
  );
}

/** Plain cautions, and the reminder that none of this is food. */
export function SupplyCautions({
  cautions,
  safetyNote,
  level = 3,
}: {
  cautions: string[];
  safetyNote: string;
  level?: HeadingLevel;
}) {
  const Heading = level === 3 ? 'h3' : 'h4';
  return (
    <section
      aria-label="Safety"
      className="space-y-2 rounded-card border-2 border-marigold-500 bg-marigold-100 p-4 text-vat-950"
    >
      <Heading className="text-xl font-bold">
        <span aria-hidden="true">⚠ </span>Safety
      </Heading>
      <ul className="list-disc space-y-1 pl-5">
        {cautions.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
      <p className="font-bold">{safetyNote}</p>
    </section>
  );
}
