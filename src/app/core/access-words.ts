/**
 * The one way Fieldcurve tells a person that something is not for them: in plain words, never
 * naming the roles it would take, which mean nothing to the person reading.
 */
export const notOpenToYourAccount = 'This page is not open to your account.';
