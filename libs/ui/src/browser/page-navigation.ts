import { DOCUMENT } from '@angular/common';
import { inject, Injectable } from '@angular/core';

/** Full-page navigation, for moving between the two apps (their routers do not know each other). */
@Injectable({ providedIn: 'root' })
export class PageNavigation {
  private readonly document = inject(DOCUMENT);

  /** Loads `url` in this tab. */
  assign(url: string): void {
    this.document.location.assign(url);
  }
}
