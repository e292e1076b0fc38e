// One look for every text box and list; aria-invalid turns a control red when its field has an error.
const controlLook =
  'rounded-md border bg-paper-raised text-ink placeholder:text-ink-faint disabled:cursor-not-allowed ' +
  'disabled:bg-paper-sunk aria-invalid:border-danger aria-invalid:bg-danger-soft/40';

export const inputClassName = `${controlLook} mt-1 block h-10 w-full px-3`;
export const textareaClassName = `${controlLook} mt-1 block min-h-24 w-full px-3 py-2`;
export const selectClassName = `${controlLook} mt-1 block h-10 w-full pl-3 pr-8`;
/** For a list inside a table row, where a full-height field would crowd the row. */
export const compactSelectClassName = `${controlLook} h-8 min-w-28 pl-2 pr-7 text-sm`;
