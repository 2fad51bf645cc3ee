import { InjectionToken, type Type } from '@angular/core';
import type { Role } from '@shared/auth/roles';

/**
 * A small status a feature shows in the shell's toolbar (the field sync state, say). The shell
 * knows no feature: the app's configuration lists the widgets, each loaded lazily and only for
 * the roles it is meant for.
 */
export interface ToolbarWidget {
  readonly audience: readonly Role[];
  readonly load: () => Promise<Type<unknown>>;
}

export const TOOLBAR_WIDGETS = new InjectionToken<readonly ToolbarWidget[]>('toolbar widgets', {
  factory: () => [],
});
