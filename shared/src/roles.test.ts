import { describe, expect, it } from 'vitest';
import { canAssignRole, isRole } from './roles.js';

describe('roles', () => {
  it('recognises the four roles and nothing else', () => {
    expect(['owner', 'office', 'sharpener', 'client'].every(isRole)).toBe(true);
    expect(isRole('admin')).toBe(false);
    expect(isRole(3)).toBe(false);
  });

  it('lets only an owner make an owner', () => {
    expect(canAssignRole('owner', 'owner')).toBe(true);
    expect(canAssignRole('office', 'owner')).toBe(false);
    expect(canAssignRole('office', 'sharpener')).toBe(true);
    expect(canAssignRole('sharpener', 'client')).toBe(false);
  });
});
