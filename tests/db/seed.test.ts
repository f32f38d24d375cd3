/** The demo seed creates the invented organisations once, with the right roles, and is idempotent. */
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { seedDemo } from '@/demo/seed';

describe('demo seed', () => {
  it('creates both organisations and five users, and changes nothing the second time', async () => {
    await seedDemo();
    const second = await seedDemo();
    expect(second.created).toEqual([]);
    const rows = await db
      .selectFrom('member')
      .innerJoin('user', 'user.id', 'member.userId')
      .innerJoin('organization', 'organization.id', 'member.organizationId')
      .select(['user.email', 'member.role', 'organization.name', 'user.emailVerified'])
      .orderBy('user.email')
      .execute();
    expect(rows).toEqual([
      { email: 'admin@kestrelbay.example', role: 'admin', name: 'Kestrel Bay Materials', emailVerified: true },
      { email: 'analyst@kestrelbay.example', role: 'analyst', name: 'Kestrel Bay Materials', emailVerified: true },
      { email: 'executive@kestrelbay.example', role: 'viewer', name: 'Kestrel Bay Materials', emailVerified: true },
      { email: 'owner@harrowfen.example', role: 'admin', name: 'Harrow Fen Logistics', emailVerified: true },
      { email: 'reviewer@kestrelbay.example', role: 'reviewer', name: 'Kestrel Bay Materials', emailVerified: true },
    ]);
  });
});
