import { Directive, input, output } from '@angular/core';
import type { Block } from '@shared/questionnaire/block';
import type { MoneyContext } from '../fields/money-context';

/** What every kind's settings panel takes and gives: its block in, the changed block out. */
@Directive()
export abstract class KindSettings<B extends Block> {
  readonly block = input.required<B>();
  readonly money = input.required<MoneyContext>();
  readonly readOnly = input(false);
  readonly blockChange = output<Block>();

  /** Emits the block with `change` applied; fields set to undefined drop out when saved. */
  protected patch(change: Partial<B>): void {
    this.blockChange.emit({ ...this.block(), ...change } as Block);
  }
}

/** Styles shared by the settings panels. */
export const settingsStyles = `
  :host {
    display: grid;
    gap: 12px;
  }
  mat-form-field {
    width: 100%;
  }
  .pair {
    display: grid;
    grid-template-columns: 1fr;
    gap: 12px;
  }
  @media (min-width: 480px) {
    .pair {
      grid-template-columns: 1fr 1fr;
    }
  }
`;
