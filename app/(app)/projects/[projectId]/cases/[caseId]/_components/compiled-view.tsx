'use client';

import { useMemo } from 'react';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { ModelError, prepareModel, type ProjectModel } from '@/lattice';
import { formatNumber } from '@/lib/format';
import { describeCost, describeWindow } from '@/lib/option-words';

/**
 * The advanced view: the operating modes and switches the option cards compile to, as the
 * engine sees them (negative costs are proceeds). Useful to check how rights combine.
 */
export function CompiledView({ model }: { model: ProjectModel | null }) {
  const compiled = useMemo(() => {
    if (!model) return null;
    try {
      return { ok: true as const, ...prepareModel(model).compiled };
    } catch (error) {
      if (error instanceof ModelError) return { ok: false as const, issues: error.issues };
      throw error;
    }
  }, [model]);
  if (!compiled) return <p className="text-ink-soft">Enter cash flows with a positive operating value to see the compiled model.</p>;
  if (!compiled.ok)
    return (
      <ul role="alert" className="text-brick-700">
        {compiled.issues.map((i) => (
          <li key={i.field + i.message}>{i.message}</li>
        ))}
      </ul>
    );
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-6 xl:grid-cols-2">
      <Table caption="Operating modes">
        <thead>
          <tr>
            <Th>Mode</Th>
            <Th numeric>Scale</Th>
            <Th numeric>Cash flow a year</Th>
          </tr>
        </thead>
        <tbody>
          {compiled.modes.map((m, k) => (
            <Tr key={m.id}>
              <Td>
                {m.id}
                {k === compiled.start ? <span className="ml-2 rounded bg-paper-sunk px-1.5 text-caption text-ink-soft">start</span> : null}
              </Td>
              <Td numeric>{formatNumber(m.scale, 2)}</Td>
              <Td numeric>{formatNumber(m.flowPerYear, 2)}</Td>
            </Tr>
          ))}
        </tbody>
      </Table>
      <Table caption="Switches between modes">
        <thead>
          <tr>
            <Th>Right</Th>
            <Th>From → to</Th>
            <Th>Cost (− = proceeds)</Th>
            <Th>When</Th>
          </tr>
        </thead>
        <tbody>
          {compiled.switches.map((s, k) => (
            <Tr key={k}>
              <Td>{compiled.rights[s.right]?.id}</Td>
              <Td>
                {compiled.modes[s.from]?.id} → {compiled.modes[s.to]?.id}
              </Td>
              <Td className="figures">{describeCost(s.cost)}</Td>
              <Td>{describeWindow(s.window)}</Td>
            </Tr>
          ))}
        </tbody>
      </Table>
    </div>
  );
}
