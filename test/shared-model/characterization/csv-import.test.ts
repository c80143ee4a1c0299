import { describe, expect, it } from 'vitest';
import { parseDiameterCsv, parseLineScanCsv } from '../../../shared-model/characterization/csv-import';
import { domainErrorOf as errorOf } from '../../support/domain-error';

describe('diameter CSV import', () => {
  it('reads one column without a header', () => {
    expect(parseDiameterCsv('5.1\n6.2\n7.3\n').diametersNm).toEqual([5.1, 6.2, 7.3]);
  });

  it('strips a byte-order mark and accepts CRLF and blank lines', () => {
    const r = parseDiameterCsv('\uFEFFDiameter (nm)\r\n5.1\r\n\r\n6.2\r\n   \r\n7.3\r\n');
    expect(r.diametersNm).toEqual([5.1, 6.2, 7.3]);
    expect(r.headerPresent).toBe(true);
    expect(r.column.name).toBe('Diameter (nm)');
  });

  it('accepts decimal commas with semicolons and tabs', () => {
    expect(parseDiameterCsv('d;area\n5,5;1\n6,25;2\n7;3\n', { column: 'd' }).diametersNm).toEqual([5.5, 6.25, 7]);
    expect(parseDiameterCsv('Feret\tArea\n5,5\t1\n6,5\t2\n7,5\t3\n').diametersNm).toEqual([5.5, 6.5, 7.5]);
  });

  it('reads a one-column file of decimal commas and says so', () => {
    const r = parseDiameterCsv('12,5\n13,1\n11,9\n');
    expect(r.diametersNm).toEqual([12.5, 13.1, 11.9]);
    expect(r.notes.join(' ')).toMatch(/decimal comma/);
  });

  it('keeps an index column apart from the diameters', () => {
    const r = parseDiameterCsv('1,12\n2,13\n3,11\n', { column: 2 });
    expect(r.diametersNm).toEqual([12, 13, 11]);
  });

  it('picks a diameter-like column from an image-analysis export, or asks for one', () => {
    const imagej = ' ,Area,Mean,Feret\n1,20.1,130,5.2\n2,25.3,128,5.8\n3,30.2,131,6.4\n';
    const r = parseDiameterCsv(imagej);
    expect(r.column).toEqual({ number: 4, name: 'Feret' });
    expect(r.diametersNm).toEqual([5.2, 5.8, 6.4]);
    const e = errorOf(() => parseDiameterCsv('Area,Mean\n1,2\n3,4\n5,6\n'));
    expect(e.field).toBe('column');
    expect(e.message).toMatch(/2 columns.*"Area".*"Mean"/);
  });

  it('converts µm to nm and refuses pixels', () => {
    expect(
      parseDiameterCsv('Diameter (µm)\n0.005\n0.006\n0.007\n').diametersNm.map((d) => Number(d.toFixed(9))),
    ).toEqual([5, 6, 7]);
    expect(errorOf(() => parseDiameterCsv('Feret (px)\n50\n60\n70\n')).message).toMatch(/pixels/);
  });

  it('names the line and the value of a malformed row', () => {
    const e = errorOf(() => parseDiameterCsv('diameter\n5.1\n\n6.x\n7\n'));
    expect(e.message).toBe('line 4: "6.x" in column "diameter" is not a number');
    const first = errorOf(() => parseDiameterCsv('5.x\n6\n7\n'));
    expect(first.message).toMatch(/line 1: "5.x"/);
  });

  it('rejects negative diameters, empty files and too few particles', () => {
    expect(errorOf(() => parseDiameterCsv('5\n-3\n6\n')).message).toBe('line 2: diameter "-3" is not positive');
    expect(errorOf(() => parseDiameterCsv('\r\n  \n')).message).toMatch(/empty/);
    expect(errorOf(() => parseDiameterCsv('d\n5\n6\n')).message).toMatch(/at least 3/);
    expect(errorOf(() => parseDiameterCsv('a;b\n1;2\n3;4\n5;6\n', { column: 3 })).message).toMatch(
      /column 3 does not exist/,
    );
  });
});

describe('line-scan CSV import', () => {
  const rows = (sep: string, dec: (v: number) => string) =>
    Array.from({ length: 15 }, (_, i) => [dec(i * 0.5), dec(10 + i), dec(20 - i)].join(sep)).join('\r\n');

  it('finds the columns by element symbol and reads counts', () => {
    const text = `Distance (nm),Pd L,Au M\n${rows(',', String)}`;
    const r = parseLineScanCsv(text, { elementA: 'Au', elementB: 'Pd' });
    expect(r.unit).toBe('counts');
    expect(r.positionsNm[2]).toBe(1);
    expect(r.signalA[0]).toBe(20); // Au is the third column
    expect(r.signalB[0]).toBe(10);
    expect(r.columns).toEqual({ position: '"Distance (nm)"', a: '"Au M"', b: '"Pd L"' });
  });

  it('recognises at.% headers, semicolons and decimal commas', () => {
    const text = `x (nm);Au at.%;Pd at.%\n${rows(';', (v) => String(v).replace('.', ','))}`;
    const r = parseLineScanCsv(text, { elementA: 'Au', elementB: 'Pd' });
    expect(r.unit).toBe('atPercent');
    expect(r.positionsNm[1]).toBe(0.5);
  });

  it('takes position, A, B in order without a header and sorts reversed scans', () => {
    const text = Array.from({ length: 14 }, (_, i) => `${13 - i}\t${i}\t${2 * i}`).join('\n');
    const r = parseLineScanCsv(text, { elementA: 'Ni', elementB: 'Pt' });
    expect(r.positionsNm[0]).toBe(0);
    expect(r.signalA[0]).toBe(13);
    expect(r.notes.join(' ')).toMatch(/sorted/);
  });

  it('reports malformed rows, duplicate positions and short scans', () => {
    const bad = `pos,Au,Pd\n${rows(',', String)}\n7.5,12,abc`;
    expect(errorOf(() => parseLineScanCsv(bad, { elementA: 'Au', elementB: 'Pd' })).message).toBe(
      'line 17: "abc" in column "Pd" is not a number',
    );
    expect(
      errorOf(() => parseLineScanCsv('pos,Au,Pd\n1,2,3\n2,3,4\n', { elementA: 'Au', elementB: 'Pd' })).message,
    ).toMatch(/at least 12 points/);
    const dup = Array.from({ length: 13 }, (_, i) => `${i === 12 ? 3 : 12 - i},1,1`).join('\n');
    expect(errorOf(() => parseLineScanCsv(dup, { elementA: 'Au', elementB: 'Pd' })).message).toMatch(
      /both give position 3 nm/,
    );
    expect(errorOf(() => parseLineScanCsv('1,2\n3,4\n', { elementA: 'Au', elementB: 'Pd' })).message).toMatch(
      /three columns/,
    );
  });
});
