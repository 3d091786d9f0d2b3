import { OverlayContainer } from '@angular/cdk/overlay';
import { Injectable, Provider } from '@angular/core';

/**
 * The container of menus, select panels and dialogs, marked as a labelled region so that their
 * content sits inside a landmark like the rest of the page.
 */
@Injectable()
export class LabelledOverlayContainer extends OverlayContainer {
  protected override _createContainer(): void {
    super._createContainer();
    this._containerElement?.setAttribute('role', 'region');
    this._containerElement?.setAttribute('aria-label', 'Menus and dialogs');
  }
}

/** Provides {@link LabelledOverlayContainer} in place of the default overlay container. */
export function provideLabelledOverlayContainer(): Provider {
  return { provide: OverlayContainer, useClass: LabelledOverlayContainer };
}
