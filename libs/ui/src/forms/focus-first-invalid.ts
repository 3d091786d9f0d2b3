/** Moves keyboard focus to the first invalid form control inside `host`, so the user lands on the problem. */
export function focusFirstInvalid(host: HTMLElement): void {
  const target = host.querySelector<HTMLElement>('input.ng-invalid, textarea.ng-invalid, mat-select.ng-invalid');
  target?.focus();
}
