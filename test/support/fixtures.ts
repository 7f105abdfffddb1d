import bcrypt from 'bcryptjs';
import { randomUUID } from 'node:crypto';
import { Pool } from 'pg';

export const PASSWORD = 'fixture-password-1';
const HASH = bcrypt.hashSync(PASSWORD, 4);
const ROLES = ['ADMIN', 'RESEARCHER', 'CORRELATOR', 'ANALYST', 'VIEWER'] as const;
export type FixtureRole = (typeof ROLES)[number];

export interface ProjectFixture {
  projectId: string;
  /** E-mail per role, each a member with that role. */
  emails: Record<FixtureRole, string>;
  /** Someone with no membership in this project. */
  outsiderEmail: string;
}

/**
 * A project with one member per role and an outsider, written straight into the database (users
 * are otherwise only made by invitation or the demo seed). Names are unique per call.
 */
export async function createProjectFixture(name = 'Fixture project'): Promise<ProjectFixture> {
  const pool = new Pool({ connectionString: process.env.DATABASE_URL });
  const tag = randomUUID().slice(0, 8);
  try {
    const { rows } = await pool.query<{ id: string }>(
      `insert into projects (name, tectonic_setting) values ($1, 'SUBDUCTION_INTERFACE') returning id`,
      [`${name} ${tag}`],
    );
    const projectId = rows[0].id;
    const emails = {} as Record<FixtureRole, string>;
    for (const role of ROLES) {
      const email = `${role.toLowerCase()}-${tag}@fixture.test`;
      const user = await pool.query<{ id: string }>(
        `insert into users (email, display_name, password_hash) values ($1, $2, $3) returning id`,
        [email, `${role} ${tag}`, HASH],
      );
      await pool.query(`insert into memberships (project_id, user_id, role) values ($1, $2, $3)`, [projectId, user.rows[0].id, role]);
      emails[role] = email;
    }
    const outsiderEmail = `outsider-${tag}@fixture.test`;
    await pool.query(`insert into users (email, display_name, password_hash) values ($1, 'Outsider', $2)`, [outsiderEmail, HASH]);
    return { projectId, emails, outsiderEmail };
  } finally {
    await pool.end();
  }
}

/** A signed-up user with the fixture password and no membership (an operator, say). */
export async function createUser(email: string, displayName = 'Fixture user'): Promise<void> {
  await sql(`insert into users (email, display_name, password_hash) values ($1, $2, $3)`, [email, displayName, HASH]);
}

/** Run one SQL query against the test database (for checking what was or was not written). */
export async function sql<T extends Record<string, unknown>>(text: string, params: unknown[] = []): Promise<T[]> {
  const pool = new Pool({ connectionString: process.env.DATABASE_URL });
  try {
    return (await pool.query<T>(text, params)).rows;
  } finally {
    await pool.end();
  }
}
