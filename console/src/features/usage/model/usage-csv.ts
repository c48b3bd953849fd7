import type { components } from '@/lib/api-schema';

type UsageRow = components['schemas']['UsageRowDto'];

const header = ['day', 'api_key_id', 'endpoint', 'requests', 'units', 'observations'] as const;

/** One CSV field (RFC 4180): quoted when it holds a comma, quote, or line break; quotes doubled. */
export function csvField(value: string | number | null): string {
  if (value === null) return '';
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** The usage rows as CSV with CRLF line ends; console calls without a key have an empty key id. */
export function usageCsv(rows: readonly UsageRow[]): string {
  const lines = [header.join(',')];
  for (const row of rows) {
    lines.push([row.day, row.apiKeyId, row.endpoint, row.requests, row.units, row.observations].map(csvField).join(','));
  }
  return `${lines.join('\r\n')}\r\n`;
}

/** Saves text as a file through a temporary object URL; nothing leaves the browser. */
export function downloadText(text: string, fileName: string, type = 'text/csv;charset=utf-8'): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
