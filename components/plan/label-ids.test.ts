import { describe, expect, test } from 'vitest';
import { labelsOf, withLabels } from './label-ids';

describe('engine messages in people’s words', () => {
  test('record ids in a message become the labels the scouts gave; unknown ids stay as they are', () => {
    const labels = labelsOf([{ id: '27E7391C-AC50-4039-9591-CFCF3B9F1793', label: 'Gate walnut' }], [{ id: '746aead9-64ae-4044-9072-c4009deffd19', label: 'County road line' }]);
    expect(withLabels('Power line 746aead9-64ae-4044-9072-c4009deffd19 is 209.2 m from tree 27e7391c-ac50-4039-9591-cfcf3b9f1793.', labels)).toBe(
      'Power line “County road line” is 209.2 m from tree “Gate walnut”.',
    );
    expect(withLabels('support 00000000-0000-4000-8000-000000000001', labels)).toBe('support 00000000-0000-4000-8000-000000000001');
  });
});
