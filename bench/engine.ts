import { buildShortlist, buildSpanTable, checkMember, listMaterials, listSizes } from '@/lib/calc';
import { memberCase, shortlistCase, spanTableCase } from './cases';
import type { Figure } from './figures';
import { measure } from './measure';

// Engine benchmark. Targets: one member check < 50 µs, a full shortlist < 5 ms (DESIGN.md §9: well under
// 10 ms), a span table of all sawn sizes × 8 widths < 50 ms (DESIGN.md §9: well under 100 ms). The best
// round shows the engine's own speed when other processes share the cores.

const us = (ms: number) => `${(ms * 1000).toFixed(1)} µs`;
const ms = (value: number) => `${value.toFixed(2)} ms`;

export function engineFigures(): Figure[] {
  const sizeCount = listMaterials().reduce((n, m) => n + listSizes(m.id).length, 0);
  const sawnCount = listMaterials('sawn').reduce((n, m) => n + listSizes(m.id).length, 0);
  const member = measure(() => checkMember(memberCase), 31, 500);
  const shortlist = measure(() => buildShortlist(shortlistCase), 31, 5);
  const spanTable = measure(() => buildSpanTable(spanTableCase), 21, 3);
  return [
    {
      task: 'member check (12 ft LVL beam, roof + ceiling + floor + post)',
      measured: `median ${us(member.medianMs)}, best ${us(member.minMs)}`,
      target: '< 50 µs',
    },
    {
      task: `shortlist, every size of every material (${sizeCount})`,
      measured: `median ${ms(shortlist.medianMs)}, best ${ms(shortlist.minMs)}`,
      target: '< 5 ms',
    },
    {
      task: `span table, all sawn sizes (${sawnCount}) × 8 widths`,
      measured: `median ${ms(spanTable.medianMs)}, best ${ms(spanTable.minMs)}`,
      target: '< 50 ms',
    },
  ];
}
