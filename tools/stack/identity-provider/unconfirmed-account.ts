import { demoPassword } from '../../../server/demo/demo-people';
import type { SeedAccount } from './account-store';

/**
 * An account of the local provider whose address was never confirmed (`email_verified` false),
 * so the app's refusal of unconfirmed addresses can be tried. Not a member anywhere.
 */
export const unconfirmedAccount: SeedAccount = {
  email: 'unconfirmed.address@fieldcurve.test',
  name: 'Unconfirmed Address',
  password: demoPassword,
  emailVerified: false,
};
