import { Injectable, signal } from '@angular/core';

/**
 * Amounts typed on the screen that cannot be read, by the part of the answer they were meant
 * for. The field shows its own message; the runner reads these so it names that message once
 * instead of adding a second, misleading one about the part being left out.
 */
@Injectable()
export class TypingProblems {
  private readonly held = signal<ReadonlyMap<string, string>>(new Map());
  /** Each unreadable part's message, led by the field's name. */
  readonly byPart = this.held.asReadonly();

  note(part: string, message: string | null): void {
    const next = new Map(this.held());
    if (message === null) next.delete(part);
    else next.set(part, message);
    this.held.set(next);
  }
}
