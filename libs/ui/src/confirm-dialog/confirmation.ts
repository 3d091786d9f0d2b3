import { inject, Injectable } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { map, Observable } from 'rxjs';
import { ConfirmDialog, type ConfirmRequest } from './confirm-dialog';

/** Asks the user to confirm an action in a dialog. */
@Injectable({ providedIn: 'root' })
export class Confirmation {
  private readonly dialog = inject(MatDialog);

  /** Opens the dialog; emits true once if confirmed, false if cancelled or dismissed. */
  ask(request: ConfirmRequest): Observable<boolean> {
    return this.dialog
      .open<ConfirmDialog, ConfirmRequest, boolean>(ConfirmDialog, { data: request, width: '440px', autoFocus: 'first-tabbable' })
      .afterClosed()
      .pipe(map((answer) => answer === true));
  }
}
