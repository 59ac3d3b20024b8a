import type { ReactNode } from 'react';
import { doseRangeLabel, doseUnitLabel, type ComputedAdjunct, type ScaleChange } from '../../../../shared/brewing';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { SALT_LABELS } from '../../../../shared/schemas/recipes';
import { Table, Td, Th, cx } from '../../../components/ui';
import { show, showGrain, showMeasured, showSmallWeight } from '../../../lib/units';
import type { ScaleResult } from '../../../../shared/contract/recipes';

/** An adjunct or spice amount, rounded for measuring in the brewery's units. */
export function showAdjunct(a: ComputedAdjunct, system: UnitSystem): string {
  return showMeasured(system === 'us' ? a.measuredUs : a.measuredMetric);
}

function amount(change: ScaleChange, value: number, system: UnitSystem): string {
  switch (change.unit) {
    case 'kg':
      return showGrain(system, value);
    case 'g':
      return showSmallWeight(system, value);
    case 'L':
      return show(system, 'volume', value);
    case '°C':
      return show(system, 'temperature', value);
    default:
      return `${value.toFixed(1)} ${change.unit}`;
  }
}

function NotInProportion({ change, reason }: { change: ScaleChange; reason?: string }) {
  if (!change.nonLinear) return <span className="text-ink-500">in proportion</span>;
  return (
    <span>
      <span className="mr-1 rounded bg-brass-100 px-1.5 py-0.5 text-xs font-bold uppercase text-ink-900">
        Not in proportion
      </span>
      <span className="text-sm text-ink-700">{reason ?? change.reason}</span>
    </span>
  );
}

function Group({ title, children }: { title: string; children: ReactNode }) {
  return (
    <>
      <tr>
        <th colSpan={4} scope="colgroup" className="bg-cellar-100 px-4 py-2 text-left font-bold text-cellar-800">
          {title}
        </th>
      </tr>
      {children}
    </>
  );
}

const saltName = (item: string) => {
  const [where, id] = item.split(': ');
  const vessel = where!.replace(' salt', '');
  return `${vessel[0]!.toUpperCase()}${vessel.slice(1)}: ${SALT_LABELS[id as keyof typeof SALT_LABELS] ?? id}`;
};

/** Original and scaled side by side, every quantity in practical units, non-linear changes called out. */
export function ScaleTable({ data, system }: { data: ScaleResult; system: UnitSystem }) {
  const { scaled, version, source, target } = data;
  const byPrefix = (prefix: string) => scaled.changes.filter((c) => c.item.startsWith(prefix));
  const content = version.content;
  const rules = [...content.adjuncts, ...content.spices];
  const row = (key: string, what: ReactNode, c: ScaleChange, from: string, to: string, reason?: string) => (
    <tr key={key} className={cx(c.nonLinear && 'bg-brass-100/40')}>
      <Td className="font-medium">{what}</Td>
      <Td>{from}</Td>
      <Td className="text-lg font-semibold">{to}</Td>
      <Td>
        <NotInProportion change={c} reason={reason} />
      </Td>
    </tr>
  );
  return (
    <Table aria-label="Original and scaled">
      <thead>
        <tr>
          <Th className="w-1/4">Item</Th>
          <Th>{source.equipment.name}</Th>
          <Th>{target.equipment.name}</Th>
          <Th>Why</Th>
        </tr>
      </thead>
      <tbody>
        <Group title="Fermentables">
          {byPrefix('fermentable: ').map((c, i) =>
            row(`f${i}`, c.item.slice(13), c, amount(c, c.from, system), amount(c, c.to, system)),
          )}
        </Group>
        <Group title="Hops">
          {byPrefix('hop: ').map((c, i) =>
            row(
              `h${i}`,
              <>
                {c.item.slice(5)}
                <span className="block text-sm text-ink-500">{scaled.after.hops[i]!.ibu.toFixed(1)} IBU</span>
              </>,
              c,
              amount(c, c.from, system),
              amount(c, c.to, system),
            ),
          )}
        </Group>
        {(byPrefix('mash salt: ').length > 0 || byPrefix('sparge salt: ').length > 0) && (
          <Group title="Water salts">
            {[...byPrefix('mash salt: '), ...byPrefix('sparge salt: ')].map((c, i) => {
              const v = scaled.after.volumes;
              const water = c.item.startsWith('mash')
                ? `${show(system, 'volume', v.strikeL + v.infusionL)} of mash water`
                : `${show(system, 'volume', v.spargeL)} of sparge water`;
              return row(
                `s${i}`,
                saltName(c.item),
                c,
                `${c.from.toFixed(1)} g`,
                `${c.to.toFixed(1)} g`,
                `same ppm in ${water}`,
              );
            })}
          </Group>
        )}
        {rules.length > 0 && (
          <Group title="Adjuncts and spices (dosed per volume)">
            {byPrefix('adjunct: ').map((c, i) =>
              row(
                `a${i}`,
                <>
                  {c.item.slice(9)}
                  <span className="block text-sm text-ink-500">
                    {rules[i]!.level} {doseUnitLabel(rules[i]!.rule)} (range {doseRangeLabel(rules[i]!.rule)})
                  </span>
                </>,
                c,
                showAdjunct(scaled.before.adjuncts[i]!, system),
                showAdjunct(scaled.after.adjuncts[i]!, system),
              ),
            )}
          </Group>
        )}
        <Group title="Water and temperature">
          {scaled.changes
            .filter((c) => !c.item.includes(': '))
            .map((c, i) =>
              row(
                `w${i}`,
                c.item[0]!.toUpperCase() + c.item.slice(1),
                c,
                amount(c, c.from, system),
                amount(c, c.to, system),
                // The shared reason is in L/kg; restate the mash thickness in the brewery's units, as the editor takes it.
                c.item === 'strike temperature'
                  ? `mash thickness ${show(system, 'waterToGrain', scaled.after.thicknessLPerKg)} (was ${show(system, 'waterToGrain', scaled.before.thicknessLPerKg)})`
                  : undefined,
              ),
            )}
        </Group>
      </tbody>
    </Table>
  );
}
