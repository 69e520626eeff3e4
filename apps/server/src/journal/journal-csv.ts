import type { JournalEntryView } from '@jarday/contracts';
import { stringify } from 'csv-stringify/sync';

export const JOURNAL_CSV_COLUMNS = ['seq', 'at', 'actor', 'device', 'kind', 'station', 'load', 'detail'] as const;

/** One CSV row per journal entry, in the order of JOURNAL_CSV_COLUMNS. */
export function journalCsvRow(e: JournalEntryView): string[] {
  return [
    String(e.seq),
    e.at,
    e.actor?.name ?? 'Jarday',
    e.deviceId ?? '',
    e.type,
    e.stationLabel,
    e.loadNumber === null ? '' : String(e.loadNumber),
    e.text,
  ];
}

/**
 * The journal as CSV per RFC 4180: a header row, CRLF line ends, and a field holding a comma, a double quote or a
 * line break enclosed in double quotes with its quotes doubled. csv-stringify only quotes fields with a line break
 * when asked (`quote_record_delimiter`) once the record delimiter is set, so both are set here.
 */
export function journalCsv(entries: readonly JournalEntryView[]): string {
  return stringify([[...JOURNAL_CSV_COLUMNS], ...entries.map(journalCsvRow)], {
    record_delimiter: '\r\n',
    quote_record_delimiter: true,
  });
}
