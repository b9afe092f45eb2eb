/** The review help lists every fail-on outcome the settings source accepts (none is hidden). */
import { expect, it } from 'vitest';
import { REVIEW_HELP } from '../../src/entries/cli/help.js';
import { COST_OUTCOME_FIELDS, FAIL_ON_VALUES } from '../../src/model/settings.js';

it('names every fail-on outcome and every cost field', () => {
  const text = REVIEW_HELP.replace(/\s+/g, ' ');
  for (const outcome of FAIL_ON_VALUES) expect(text).toMatch(new RegExp(`[ :,]${outcome}[,. ]`));
  for (const field of COST_OUTCOME_FIELDS.keys()) expect(text).toContain(field);
});
