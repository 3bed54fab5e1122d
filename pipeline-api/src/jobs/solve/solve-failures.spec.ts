import { describe, expect, it } from 'vitest';
import { SolverInputError } from '@overshoot/solver';
import { DomainError } from '../../common/errors/domain-error';
import { badInput } from './solve-failures';

describe('badInput', () => {
  it('keeps a solver input error’s code, says where, and what to do', () => {
    const e = new SolverInputError('CLIP_TOO_SHORT', 'the clip lasts 0.5 s', { item: 'preroll' });
    expect(badInput(e)).toEqual({
      code: 'CLIP_TOO_SHORT',
      message: expect.stringMatching(/^the clip lasts 0\.5 s \(item preroll\)\. Lengthen/),
    });
  });

  it('treats a refusal of the service (expired consent) as bad input, not an outage', () => {
    const consent = new DomainError('invalid', 'CONSENT_EXPIRED', 'expired');
    expect(badInput(consent)).toEqual({ code: 'CONSENT_EXPIRED', message: 'expired' });
    const outage = new DomainError('unavailable', 'STORAGE_UNAVAILABLE', 'down');
    expect(badInput(outage)).toBeNull();
  });

  it('leaves other errors to be retried', () => {
    expect(badInput(new Error('connect ECONNREFUSED 127.0.0.1:4679'))).toBeNull();
  });
});
