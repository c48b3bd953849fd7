/**
 * Accumulates one column while a file streams in. A column starts numeric and stays numeric while every
 * non-empty cell is a plain decimal number; the first other cell turns it into a text column (the numbers
 * seen so far are kept as their text) and is remembered so a fit can say exactly where the text is.
 * Empty cells are missing values: NaN in numeric storage, null in text storage.
 */
const PLAIN_NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** Number() also accepts hex/binary/octal prefixes; those cells are text here. */
function hasRadixPrefix(cell: string): boolean {
  const second = cell.charCodeAt(1) | 0x20;
  return cell.length > 2 && cell.charCodeAt(0) === 48 && (second === 120 || second === 98 || second === 111);
}

/**
 * Parses a plain decimal number, or returns NaN. The fast path is Number() (the hot loop of every upload);
 * the regular expression only settles the rare cells Number() reads differently from a decimal literal.
 */
export function parsePlainNumber(cell: string): number {
  const value = +cell;
  if (value - value === 0 && !hasRadixPrefix(cell)) return value;
  return PLAIN_NUMBER.test(cell) ? Number(cell) : Number.NaN;
}

export interface FirstTextCell {
  /** 1-based line number in the file (the header is line 1). */
  line: number;
  value: string;
}

export class ColumnBuilder {
  private numbers: Float64Array = new Float64Array(1024);
  private texts: (string | null)[] | undefined;
  private length = 0;
  missing = 0;
  firstText: FirstTextCell | undefined;

  constructor(readonly name: string) {}

  get kind(): 'numeric' | 'text' {
    return this.texts ? 'text' : 'numeric';
  }

  get size(): number {
    return this.length;
  }

  push(raw: string, line: number): void {
    const first = raw.charCodeAt(0);
    const last = raw.charCodeAt(raw.length - 1);
    const cell = first <= 32 || last <= 32 ? raw.trim() : raw;
    if (this.texts) {
      if (cell === '') this.missing += 1;
      this.texts.push(cell === '' ? null : cell);
      this.length += 1;
      return;
    }
    if (this.length === this.numbers.length) {
      const grown = new Float64Array(this.numbers.length * 2);
      grown.set(this.numbers);
      this.numbers = grown;
    }
    if (cell === '') {
      this.numbers[this.length++] = Number.NaN;
      this.missing += 1;
      return;
    }
    const value = parsePlainNumber(cell);
    if (value === value) {
      this.numbers[this.length++] = value;
      return;
    }
    this.firstText = { line, value: cell.slice(0, 80) };
    this.texts = new Array<string | null>(this.length);
    for (let i = 0; i < this.length; i++) {
      const value = this.numbers[i] as number;
      this.texts[i] = Number.isNaN(value) ? null : String(value);
    }
    this.numbers = new Float64Array(0);
    this.texts.push(cell);
    this.length += 1;
  }

  /** The numeric values (NaN = missing), trimmed to length; only for numeric columns. */
  numericValues(): Float64Array {
    return this.numbers.subarray(0, this.length);
  }

  textValues(): (string | null)[] {
    return this.texts ?? [];
  }
}
