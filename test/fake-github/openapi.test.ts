/** The fake's guard against drift must itself be able to fail. */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { describe, expect, test } from 'vitest';
import { subset } from '../../scripts/openapi-subset.mjs';
import { checkResponse, convert, example } from './openapi.js';
import { FakeRepo } from './repo.js';
import { FakeGitHub } from './server.js';

const COMMENT = 'POST /repos/{owner}/{repo}/issues/{issue_number}/comments';

describe('checkResponse against GitHub OpenAPI description', () => {
  test('a response example of the description passes', () => {
    expect(checkResponse(COMMENT, 201, example('issue-comment'))).toEqual([]);
  });

  test('a drifted response is caught: wrong type, missing field', () => {
    const drifted = { ...example('issue-comment'), id: '42' } as Record<string, unknown>;
    delete drifted['html_url'];
    const problems = checkResponse(COMMENT, 201, drifted);
    expect(problems).toContain(`${COMMENT} 201: /id must be integer`);
    expect(problems).toContain(`${COMMENT} 201: / must have required property 'html_url'`);
  });

  test('nullable fields accept null (OpenAPI 3.0 nullable converted) and reject other types', () => {
    const withNullUser = { ...example('issue-comment'), user: null };
    expect(checkResponse(COMMENT, 201, withNullUser)).toEqual([]);
    expect(checkResponse(COMMENT, 201, { ...withNullUser, user: 'octocat' })).not.toEqual([]);
  });

  test('undocumented error statuses are held to basic-error; bodiless answers must be empty', () => {
    expect(
      checkResponse(COMMENT, 502, { message: 'Server Error', documentation_url: 'x' }),
    ).toEqual([]);
    expect(checkResponse(COMMENT, 502, { error: 'x', message: 1 })).not.toEqual([]);
    const download = 'GET /repos/{owner}/{repo}/actions/artifacts/{artifact_id}/{archive_format}';
    expect(checkResponse(download, 302, undefined)).toEqual([]);
    expect(checkResponse(download, 302, { url: 'x' })).toEqual([
      `${download} 302 must have no body`,
    ]);
  });

  test('an operation or status the description lacks is an error in the fake, not a pass', () => {
    expect(() => checkResponse('GET /repos/{owner}/{repo}/no-such-thing', 200, {})).toThrow(
      /no operation/,
    );
    expect(() => checkResponse(COMMENT, 200, {})).toThrow(/does not answer 200/);
  });
});

describe('convert (OpenAPI 3.0 → JSON Schema)', () => {
  test('nullable with a type, with an enum, and without a type', () => {
    expect(convert({ type: 'string', nullable: true, example: 'x' })).toEqual({
      type: ['string', 'null'],
    });
    expect(convert({ type: 'string', enum: ['a'], nullable: true })).toEqual({
      type: ['string', 'null'],
      enum: ['a', null],
    });
    expect(convert({ allOf: [{ $ref: '#/components/schemas/x' }], nullable: true })).toEqual({
      anyOf: [
        { allOf: [{ $ref: 'https://openapi.invalid/api.github.com.json#/components/schemas/x' }] },
        { type: 'null' },
      ],
    });
  });

  test('keywords beside a $ref are dropped; property maps are not mistaken for keywords', () => {
    expect(convert({ $ref: '#/components/schemas/x', description: 'ignored' })).toEqual({
      $ref: 'https://openapi.invalid/api.github.com.json#/components/schemas/x',
    });
    expect(
      convert({
        type: 'object',
        properties: { nullable: { type: 'boolean' }, example: { type: 'string' } },
      }),
    ).toEqual({
      type: 'object',
      properties: { nullable: { type: 'boolean' }, example: { type: 'string' } },
    });
  });
});

describe('the subset of the description the fake reads', () => {
  const list = JSON.parse(readFileSync('test/fake-github/operations.json', 'utf8')) as {
    operations: string[];
    examples: string[];
  };

  test('holds every operation the fake repository answers for', () => {
    const operations: string[] = [];
    const server = new FakeGitHub();
    server.on = (operation: string) => {
      operations.push(operation);
      return server;
    };
    new FakeRepo(server).install();
    expect(operations.filter((o) => !list.operations.includes(o))).toEqual([]);
  });

  test('is what the script makes from the installed @octokit/openapi', () => {
    const file = createRequire(import.meta.url).resolve(
      '@octokit/openapi/generated/api.github.com.json',
    );
    const full: unknown = JSON.parse(readFileSync(file, 'utf8'));
    const committed: unknown = JSON.parse(readFileSync('test/fake-github/api-subset.json', 'utf8'));
    // When this fails after an update of @octokit/openapi: node scripts/openapi-subset.mjs
    expect(subset(full, list)).toEqual(committed);
  }, 60_000);
});
