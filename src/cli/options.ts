/**
 * Option parsing shared by every command: the readers of src/settings/read.ts
 * (dates, ranges, lists, numbers), one error shape (InputError → one stderr
 * line, exit 2).
 */
export * from '../settings/read.ts';
