import type pg from 'pg';

/**
 * 50,000 requests spread over every status, six invented road authorities and the office, with three events
 * each, written by set-based SQL so seeding takes seconds. Names and roads come from small invented lists.
 */
export async function seedQueue(pool: pg.Pool, count = 50_000) {
  await pool.query(`
    insert into users (email, name, role)
    select 'owner' || g || '@example.test', (array['Ada','Bram','Cora','Dmitri','Esme','Fen','Greer','Hollis'])[1 + g % 8]
      || ' ' || (array['Quill','Osei','Vance','Hale','Tolliver','Ashgrove','Marsh','Penrose','Lindell'])[1 + g % 9], 'applicant'
    from generate_series(1, 2000) g;
    insert into users (email, name, role) values
      ('bench.staff@gradepass.test', 'Bench Staff', 'staff'), ('wren.office@gradepass.test', 'Wren Okoro', 'staff'),
      ('hal.office@gradepass.test', 'Hal Brennan', 'staff'), ('bench.owner@gradepass.test', 'Bench Owner', 'admin');
    insert into jurisdictions (slug, name, authority)
    select 'j' || g, (array['Fenwick County','Tamsin Township','Harrow Vale','Marl Creek County','Otterby Town','Kestrel Downs'])[g],
      'Road department' from generate_series(1, 6) g;
  `);
  await pool.query(`
    with owners as (select id, name, row_number() over (order by email) n from users where role = 'applicant'),
         office as (select id, row_number() over (order by email) n from users where role in ('staff', 'admin')),
         places as (select id, row_number() over (order by slug) n from jurisdictions),
         statuses as (select s::request_status as status, row_number() over () n from unnest(enum_range(null::request_status)) s)
    insert into requests (reference, applicant_id, status, version, status_changed_at, created_at, submitted_at, jurisdiction_id,
      assignee_id, applicant_name, site_address, road_name)
    select 'GP-2025-' || lpad(g::text, 5, '0'), o.id, st.status, 3,
      now() - (g % 4000) * interval '53 minutes', now() - (g % 4000) * interval '61 minutes', now() - (g % 4000) * interval '60 minutes',
      case when g % 11 = 0 then null else p.id end,
      case when g % 3 = 0 then null else f.id end,
      o.name, (10 + g % 990) || ' ' || (array['Larkspur Hollow','Quarry Ridge','Tamsin Mill','Otter Brook','Heron Bend','Cobble Hill'])[1 + g % 6] || ' Lane',
      (array['Quarry Ridge Road','Tamsin Mill Road','County Road 14','Old Ferry Road','Kestrel Pike','Marl Creek Road','Harrow Lane'])[1 + g % 7]
    from generate_series(1, ${Number(count)}) g
    join owners o on o.n = 1 + g % 2000
    join statuses st on st.n = 1 + (g * 7) % 15
    left join places p on p.n = 1 + (g / 15) % 6
    left join office f on f.n = 1 + g % 4;
  `);
  await pool.query(`
    insert into request_events (request_id, actor_id, kind, from_status, to_status, note, created_at)
    select r.id, r.applicant_id, 'transition', 'draft', 'submitted', '', r.submitted_at from requests r;
    insert into request_events (request_id, actor_id, kind, note, internal, created_at)
    select r.id, r.assignee_id, 'assignment', 'Assigned', true, r.submitted_at + interval '1 hour' from requests r where r.assignee_id is not null;
    insert into request_events (request_id, actor_id, kind, from_status, to_status, note, created_at)
    select r.id, r.assignee_id, 'transition', 'submitted', r.status, 'Moved on', r.status_changed_at from requests r;
  `);
  // The steady state of a live database: statistics current and the visibility map set, as autovacuum leaves
  // them. Measured straight after a bulk load, autovacuum would otherwise start in the middle of a measurement.
  await pool.query('vacuum analyze');
  const { rows } = await pool.query(
    'select (select count(*) from requests)::int as requests, (select count(*) from request_events)::int as events',
  );
  return rows[0] as { requests: number; events: number };
}
