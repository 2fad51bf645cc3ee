import { starterBlock } from '../block-starters';
import { type ConsentBlock, consentAnswerSchema, consentBlockSchema } from './consent-block';

const consent = starterBlock('consent', 'consent') as ConsentBlock;

describe('the consent block', () => {
  it('accepts a statement that is required', () => {
    expect(consentBlockSchema.safeParse(consent).success).toBe(true);
  });

  it('refuses an optional consent', () => {
    const result = consentBlockSchema.safeParse({ ...consent, required: false });
    expect(result.error?.issues[0]).toMatchObject({
      path: ['required'],
      message: 'Consent is always required',
    });
  });

  it('refuses an empty statement', () => {
    const result = consentBlockSchema.safeParse({ ...consent, statement: '   ' });
    expect(result.error?.issues[0]).toMatchObject({
      path: ['statement'],
      message: 'Write the consent statement',
    });
  });

  it('records agreement as a yes or no', () => {
    const schema = consentAnswerSchema(consent);
    expect(schema.safeParse({ agreed: false }).success).toBe(true);
    expect(schema.safeParse({ agreed: 'yes' }).success).toBe(false);
  });
});
