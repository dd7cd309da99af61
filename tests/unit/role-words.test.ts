import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { roleLabels, roles } from '@shared/workflow/roles';

const root = fileURLToPath(new URL('../..', import.meta.url));
const filesUnder = (folder: string) =>
  readdirSync(path.join(root, folder), { recursive: true, encoding: 'utf8' })
    .filter((f) => /\.(tsx?|html)$/.test(f))
    .map((f) => path.join(folder, f));

describe('one word for each role', () => {
  it('gives every role its own word, and only one says owner', () => {
    const words = roles.map((r) => roleLabels[r]);
    expect(new Set(words).size).toBe(roles.length);
    expect(roleLabels.applicant).toBe('Homeowner');
    expect(roleLabels.admin).toBe('Administrator');
    expect(words.filter((w) => /owner/i.test(w))).toEqual(['Homeowner']);
  });

  it('uses no other word for the homeowner or the administrator on any screen, e-mail, document or sign-in page', () => {
    const other = /[Pp]roperty owner|Owner \(admin\)|'Applicant'|>Applicant</;
    const offenders = ['src', 'server', 'shared', 'fakes']
      .flatMap(filesUnder)
      .filter((file) => other.test(readFileSync(path.join(root, file), 'utf8')));
    expect(offenders).toEqual([]);
  });
});
