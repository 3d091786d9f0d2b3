/** What the shell knows about the current workspace's standing with the platform. */
export interface WorkspaceStandingView {
  /** `active`, `past_due`, `read_only` or `suspended`. */
  state: 'active' | 'past_due' | 'read_only' | 'suspended';
  /** When a past-due workspace becomes read-only (ISO), when known. */
  readOnlyFrom?: string | null;
  /** Why the platform suspended the workspace, when known. */
  suspendedReason?: string | null;
}

/** The banner a workspace state calls for. */
export interface WorkspaceNotice {
  state: Exclude<WorkspaceStandingView['state'], 'active'>;
  /** Material icon ligature. */
  icon: string;
  /** The short headline ("Payment failed"). */
  title: string;
  /** What it means for the reader, in a sentence or two. */
  text: string;
}

/**
 * The notice for a workspace that is past due, read-only or suspended; null while it is active.
 * `formatDay` writes a date for the reader (the caller picks the locale).
 */
export function workspaceNotice(
  standing: WorkspaceStandingView | null | undefined,
  formatDay: (iso: string) => string,
): WorkspaceNotice | null {
  switch (standing?.state) {
    case 'past_due': {
      const when = standing.readOnlyFrom ? `on ${formatDay(standing.readOnlyFrom)}` : 'soon';
      return {
        state: 'past_due',
        icon: 'credit_card_off',
        title: 'Payment failed',
        text: `Update the payment method; the workspace becomes read-only ${when}.`,
      };
    }
    case 'read_only':
      return {
        state: 'read_only',
        icon: 'edit_off',
        title: 'Read-only',
        text: 'Saves are off; exports still work. An owner can turn saves back on by updating the payment method.',
      };
    case 'suspended': {
      const reason = standing.suspendedReason?.trim();
      return {
        state: 'suspended',
        icon: 'block',
        title: 'Suspended by the platform',
        text: `${reason ? `${reason.replace(/[.!?]$/, '')}. ` : ''}You can sign in and read, not edit.`,
      };
    }
    default:
      return null;
  }
}
