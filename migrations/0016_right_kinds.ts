/**
 * Rights name their kind under `kind`, as windows and every other record do, and the right to
 * pause and restart is `mothball`, not `switch` (leeway-lattice 4.0.0, docs/glossary.md). A
 * case's options are its working draft, so they move to the new shape here; snapshots, runs and
 * cross-checks are records and keep the JSON they were written with (lattice/stored-model.ts
 * reads them the same way). An unnamed pause-and-restart right keeps the id the engine gave it
 * (`switch-n`), so comments, comparisons and decisions still find it. The case's version does
 * not change: its figures are the same.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    update "case" c
    set options = (
      select jsonb_agg(
        case when o ? 'type'
          then (o - 'type')
            || jsonb_build_object('kind', case when o ->> 'type' = 'switch' then 'mothball' else o ->> 'type' end)
            || case when o ->> 'type' = 'switch' and not o ? 'id' then jsonb_build_object('id', 'switch-' || n) else '{}'::jsonb end
          else o end
        order by k)
      from (
        select o, k, count(*) filter (where o ->> 'type' = 'switch') over (order by k) as n
        from jsonb_array_elements(c.options) with ordinality as e(o, k)
      ) numbered
    )
    where exists (select 1 from jsonb_array_elements(c.options) o where o ? 'type')
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    update "case" c
    set options = (
      select jsonb_agg(
        case when o ? 'kind'
          then (o - 'kind') || jsonb_build_object('type', case when o ->> 'kind' = 'mothball' then 'switch' else o ->> 'kind' end)
          else o end
        order by k)
      from jsonb_array_elements(c.options) with ordinality as e(o, k)
    )
    where exists (select 1 from jsonb_array_elements(c.options) o where o ? 'kind')
  `.execute(db);
}
