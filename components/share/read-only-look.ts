/**
 * The shared page's read-only look: a setting the visitor cannot change shows as its value (no box, no arrow, no
 * slider, full-strength ink), not as a greyed control that looks editable. Applied to a container as Tailwind
 * descendant variants; `markReadOnly` adds aria-readonly so assistive technology says "read-only" too.
 */
export const READ_ONLY_LOOK = [
  '[&_select:disabled]:appearance-none [&_select:disabled]:border-transparent [&_select:disabled]:bg-transparent [&_select:disabled]:bg-none [&_select:disabled]:px-0 [&_select:disabled]:font-medium [&_select:disabled]:text-ink [&_select:disabled]:opacity-100 [&_select:disabled]:cursor-default',
  '[&_input:disabled:not([type=checkbox]):not([type=radio]):not([type=range])]:border-transparent [&_input:disabled:not([type=checkbox]):not([type=radio]):not([type=range])]:bg-transparent [&_input:disabled:not([type=checkbox]):not([type=radio]):not([type=range])]:px-0 [&_input:disabled:not([type=checkbox]):not([type=radio]):not([type=range])]:font-medium [&_input:disabled:not([type=checkbox]):not([type=radio]):not([type=range])]:text-ink [&_input:disabled:not([type=checkbox]):not([type=radio]):not([type=range])]:opacity-100 [&_input:disabled:not([type=checkbox]):not([type=radio]):not([type=range])]:cursor-default',
  '[&_input[type=number]:disabled]:[appearance:textfield] [&_input[type=number]:disabled::-webkit-inner-spin-button]:appearance-none',
  '[&_input[type=range]:disabled]:hidden',
  '[&_input[type=checkbox]:disabled]:opacity-100 [&_input[type=radio]:disabled]:opacity-100 [&_input:disabled]:cursor-default',
  '[&_textarea:disabled]:border-transparent [&_textarea:disabled]:bg-transparent [&_textarea:disabled]:text-ink',
  '[&_fieldset:disabled]:border-dashed',
  // An action the visitor cannot take is not shown as a greyed button.
  '[&_button:disabled]:hidden',
].join(' ');

/** Form controls a visitor cannot change (disabled) get aria-readonly (roles that support it: text, number, select, checkbox). */
export function markReadOnly(root: HTMLElement): void {
  root.querySelectorAll<HTMLInputElement | HTMLSelectElement | HTMLTextAreaElement>('input:disabled, select:disabled, textarea:disabled').forEach((el) => {
    const type = el instanceof HTMLInputElement ? el.type : '';
    if (type === 'radio' || type === 'range' || type === 'hidden') return;
    if (el.getAttribute('aria-readonly') !== 'true') el.setAttribute('aria-readonly', 'true');
  });
}
