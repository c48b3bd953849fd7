import { CsvTableReader } from './csv-table-reader';
import { IngestError } from './ingest-error';

function read(text: string, chunkSize = 7, delimiter?: ',' | ';') {
  const reader = new CsvTableReader(delimiter);
  for (let i = 0; i < text.length; i += chunkSize) reader.write(text.slice(i, i + chunkSize));
  return reader.end();
}

function failure(text: string): IngestError {
  try {
    read(text);
  } catch (error) {
    if (error instanceof IngestError) return error;
    throw error;
  }
  throw new Error('expected an IngestError');
}

describe('CsvTableReader', () => {
  it('reads numeric columns across chunk boundaries, with CRLF line ends and a trailing newline', () => {
    const table = read('ticket_size,fee\r\n10.5,0.61\r\n20,0.88\r\n-3e2,1.5\r\n');
    expect(table.rowCount).toBe(3);
    expect(Array.from(table.columns[0]!.numericValues())).toEqual([10.5, 20, -300]);
    expect(Array.from(table.columns[1]!.numericValues())).toEqual([0.61, 0.88, 1.5]);
  });

  it('strips a UTF-8 byte-order mark from the first header name', () => {
    const table = read('\uFEFFamount,rate\n1,2\n');
    expect(table.columns.map((column) => column.name)).toEqual(['amount', 'rate']);
  });

  it('treats empty cells as missing values', () => {
    const table = read('a,b\n1,\n,4\n5,6\n');
    expect(table.columns[0]!.missing).toBe(1);
    expect(Number.isNaN(table.columns[1]!.numericValues()[0]!)).toBe(true);
  });

  it('turns a column with a non-numeric cell into text and remembers the first such row', () => {
    const table = read('merchant,fee\nm1,1\n2,2\nn/a,3\n');
    expect(table.columns[0]!.kind).toBe('text');
    expect(table.columns[0]!.firstText).toEqual({ line: 1, value: 'm1' });
    const mixed = read('fee,region\n1,north\n2x,south\n');
    expect(mixed.columns[0]!.kind).toBe('text');
    expect(mixed.columns[0]!.firstText).toEqual({ line: 2, value: '2x' });
    expect(mixed.columns[0]!.textValues()).toEqual(['1', '2x']);
  });

  it('reads quoted values with the general parser', () => {
    const table = read('merchant,fee\n"Quayside, Ltd",1.5\n"Orbit ""North""",2\n', 5);
    expect(table.columns[0]!.textValues()).toEqual(['Quayside, Ltd', 'Orbit "North"']);
    expect(Array.from(table.columns[1]!.numericValues())).toEqual([1.5, 2]);
  });

  it.each([
    ['', 'empty-file'],
    ['\uFEFF  \n', 'empty-file'],
    ['a,b\n', 'no-data-rows'],
    ['a,a\n1,2\n', 'duplicate-header'],
    ['a,,c\n1,2,3\n', 'empty-header'],
    ['a;b\n1;2\n', 'wrong-delimiter'],
    ['a\tb\n1\t2\n', 'wrong-delimiter'],
    ['a,b,c\n1,2,3\n4\n5,6,7\n', 'malformed-row'],
    ['a,b\n1,2\n3,4,5\n', 'malformed-row'],
    ['a,b\n"1",2\n3,4,5\n', 'malformed-row'],
  ])('refuses %j with %s', (text, code) => {
    expect(failure(text).code).toBe(code);
  });

  it('names the short row', () => {
    expect(failure('a,b,c\n1,2,3\n4\n5,6,7\n').details.rows).toEqual([2]);
  });

  it('accepts an explicit semicolon delimiter', () => {
    const table = read('a;b\n1;2\n', 3, ';');
    expect(Array.from(table.columns[1]!.numericValues())).toEqual([2]);
  });
});
