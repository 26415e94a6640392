import { buildShortlist, buildSpanTable, checkMember, listMaterials, listSizes } from '@/lib/calc';
import { memberCase, shortlistCase, spanTableCase } from './cases';
import { measure } from './measure';

// Engine benchmark (npm run bench). Targets: one member check < 50 µs, a full shortlist < 5 ms (DESIGN.md
// §9: well under 10 ms), a span table of all sawn sizes × 8 widths < 50 ms (DESIGN.md §9: well under 100 ms).
// The best round shows the engine's own speed when other processes share the cores.
const sizeCount = listMaterials().reduce((n, m) => n + listSizes(m.id).length, 0);
const sawnCount = listMaterials('sawn').reduce((n, m) => n + listSizes(m.id).length, 0);

const member = measure(() => checkMember(memberCase), 31, 500);
const shortlist = measure(() => buildShortlist(shortlistCase), 31, 5);
const spanTable = measure(() => buildSpanTable(spanTableCase), 21, 3);

const us = (ms: number) => `${(ms * 1000).toFixed(1)} µs`;
const ms = (value: number) => `${value.toFixed(2)} ms`;
const line = (label: string, median: string, best: string, target: string) =>
  console.log(
    `${label.padEnd(54)} median ${median.padStart(9)}   best ${best.padStart(9)}   (target ${target})`,
  );

line('member check', us(member.medianMs), us(member.minMs), '< 50 µs');
line(
  `shortlist, every size of every material (${sizeCount})`,
  ms(shortlist.medianMs),
  ms(shortlist.minMs),
  '< 5 ms',
);
line(
  `span table, all sawn sizes (${sawnCount}) × 8 widths`,
  ms(spanTable.medianMs),
  ms(spanTable.minMs),
  '< 50 ms',
);
