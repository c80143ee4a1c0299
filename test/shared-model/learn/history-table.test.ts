/**
 * History table import (issue 11): columns, decimal commas with semicolons, all-or-nothing errors naming
 * line, column and value.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseHistoryTable } from '../../../shared-model/learn/history-table';
import { demoHistoryCsv, DEMO_HISTORY_ROWS } from '../../../shared-model/learn/demo-history';
import { domainErrorOf } from '../../support/domain-error';

const HEADER = 'pair,xB_at_pct,diameter_nm,temperature_k,route,observed,made_on,notes';

describe('parseHistoryTable', () => {
  it('reads rows with at.% as a fraction, oleylamine as the organic route and core@shell labels of the pair', () => {
    const t = parseHistoryTable(
      `${HEADER}\nPt-Ni,30,5.5,298,co-reduction,Ni@Pt,2026-03-02,first try\nAu-Pd,50,8,473,oleylamine,alloy,,\n`,
    );
    expect(t.rows).toHaveLength(2);
    expect(t.rows[0]).toMatchObject({
      line: 2,
      elementA: 'Pt',
      elementB: 'Ni',
      xB: 0.3,
      diameterNm: 5.5,
      temperatureK: 298,
      route: 'co-reduction',
      observed: 'Ni@Pt',
      madeOn: '2026-03-02',
      notes: 'first try',
    });
    expect(t.rows[1]).toMatchObject({ route: 'organic', observed: 'alloy', madeOn: null });
  });

  it('accepts semicolons with decimal commas and columns in any order; same rows, same fingerprint', () => {
    const a = parseHistoryTable(`${HEADER}\nPt-Ni,30.5,5.5,298,polyol,Janus,,\n`);
    const b = parseHistoryTable(
      'observed;pair;route;xB_at_pct;diameter_nm;temperature_k\nJanus;Pt-Ni;polyol;30,5;5,5;298\n',
    );
    expect(b.rows[0]).toMatchObject({ xB: 0.305, diameterNm: 5.5, observed: 'Janus' });
    expect(a.rows[0]?.xB).toBe(b.rows[0]?.xB);
    expect(parseHistoryTable(`${HEADER}\nPt-Ni,30.5,5.5,298,polyol,Janus,,\n`).fingerprint).toBe(a.fingerprint);
  });

  it('refuses the whole table with line, column and value of each bad cell', () => {
    const text = [
      HEADER,
      'Pt-Ni,30,5,298,co-reduction,alloy,,',
      'Pt-Xx,30,5,298,polyol,alloy,,',
      'Pt-Ni,130,5,298,polyol,alloy,,',
      'Pt-Ni,30,5,298,polyol,Au@Pt,,',
      'Pt-Ni,30,5,298,boiling,alloy,2026-13-01,',
    ].join('\n');
    const error = domainErrorOf(() => parseHistoryTable(text));
    expect(error.message).toContain('nothing imported');
    expect(error.message).toContain('line 3, column pair, value "Pt-Xx": unknown element "Xx"');
    expect(error.message).toContain('line 4, column xB_at_pct, value "130"');
    expect(error.message).toContain(
      'line 5, column observed, value "Au@Pt": the label names a metal not in the pair Pt-Ni',
    );
    expect(error.message).toContain('line 6, column route, value "boiling"');
    expect(error.message).toContain('line 6, column made_on, value "2026-13-01"');
  });

  it('names missing columns', () => {
    expect(domainErrorOf(() => parseHistoryTable('pair,observed\nPt-Ni,alloy\n')).message).toContain(
      'missing columns xB_at_pct, diameter_nm, temperature_k, route',
    );
  });

  it('reads the demo history (demo data) in full', () => {
    const t = parseHistoryTable(demoHistoryCsv());
    expect(t.rows).toHaveLength(DEMO_HISTORY_ROWS);
    expect(t.rows.every((r) => r.notes.includes('demo data'))).toBe(true);
  });

  it('docs/demo-history.csv is the table the generator writes (regenerate it when the generator changes)', () => {
    expect(readFileSync(new URL('../../../docs/demo-history.csv', import.meta.url), 'utf8')).toBe(demoHistoryCsv());
  });
});
