import type { LogError } from './types';

/** Errors past this many are summed up in one line: a broken file would otherwise list every row. */
export const MAX_REPORTED_ERRORS = 20;

/** Collects errors, keeps the first MAX_REPORTED_ERRORS and ends the list with "and N more". */
export class ErrorList {
  private readonly kept: LogError[] = [];
  private firstDropped: LogError | null = null;
  private dropped = 0;

  add(row: number, column: string | null, message: string): void {
    if (this.kept.length < MAX_REPORTED_ERRORS) {
      this.kept.push({ row, column, message });
      return;
    }
    this.firstDropped ??= { row, column, message };
    this.dropped += 1;
  }

  get empty(): boolean {
    return this.kept.length === 0;
  }

  list(): LogError[] {
    if (!this.firstDropped) return [...this.kept];
    const more = `and ${this.dropped} more ${this.dropped === 1 ? 'problem' : 'problems'} (the first at line ${this.firstDropped.row})`;
    return [...this.kept, { row: this.firstDropped.row, column: null, message: more }];
  }
}
