/** A navigation entry of the app shell. */
export interface ShellLink {
  /** Visible label. */
  label: string;
  /** Router path inside the app (`routerLink`), or a full href when `external` is set. */
  path: string;
  /** Material icon ligature. */
  icon?: string;
  /** `data-testid` for browser tests. */
  testId?: string;
  /** A link to the other app: a plain href rather than a router link. */
  external?: boolean;
}
