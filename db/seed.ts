import { eq } from "drizzle-orm";

import { hashPassword } from "@/lib/server/accounts/auth/password";
import type { Role } from "@/lib/shared/permissions";
import { seedDemoRecords } from "@/lib/server/records/seed-demo-records";
import { seedDemoWorkspace } from "@/lib/server/workspace/seed-demo-workspace";

import { createDb, requireDatabaseUrl } from "./client";
import { memberships, teams } from "./schema/teams";
import { users } from "./schema/users";

// `npm run db:seed`: invented demo data, safe to run on every start. Existing rows are left
// alone (a demo user who changed a password keeps it); missing ones are created.
const TEAM = { slug: "demo-composites-lab", name: "Demo composites lab (invented)" };
const DEMO_USERS: { role: Role; name: string; password: string }[] = [
  { role: "owner", name: "Olga Owner (invented)", password: "demo-owner-password" },
  { role: "editor", name: "Emil Editor (invented)", password: "demo-editor-password" },
  { role: "reviewer", name: "Rita Reviewer (invented)", password: "demo-reviewer-password" },
  { role: "viewer", name: "Vik Viewer (invented)", password: "demo-viewer-password" },
];
const emailOf = (role: Role) => `${role}@demo.craquelure.local`;

async function main() {
  const { db, close } = createDb(requireDatabaseUrl(), { max: 1 });
  try {
    await db.insert(teams).values(TEAM).onConflictDoNothing({ target: teams.slug });
    const [team] = await db.select().from(teams).where(eq(teams.slug, TEAM.slug));
    for (const demo of DEMO_USERS) {
      const email = emailOf(demo.role);
      const { hash, salt } = await hashPassword(demo.password);
      await db
        .insert(users)
        .values({
          email,
          name: demo.name,
          passwordHash: hash,
          passwordSalt: salt,
          verifiedAt: new Date(),
        })
        .onConflictDoNothing({ target: users.email });
      const [user] = await db.select().from(users).where(eq(users.email, email));
      await db
        .insert(memberships)
        .values({ teamId: team.id, userId: user.id, role: demo.role })
        .onConflictDoNothing();
    }
    const [editor] = await db
      .select()
      .from(users)
      .where(eq(users.email, emailOf("editor")));
    await seedDemoRecords(db, team.id, editor?.id ?? null);
    if (editor) {
      const actor = { id: editor.id, email: editor.email, name: editor.name, verified: true };
      await seedDemoWorkspace(db, team, actor);
    }
    console.log(`Demo team (invented data): "${TEAM.name}" at /teams/${TEAM.slug}`);
    console.log("Demo accounts (invented; passwords as seeded, unless changed since):");
    for (const demo of DEMO_USERS) {
      console.log(`  ${demo.role.padEnd(8)} ${emailOf(demo.role).padEnd(34)} ${demo.password}`);
    }
  } finally {
    await close();
  }
}

main().catch((error: unknown) => {
  console.error("seeding failed:", error instanceof Error ? error.message : error);
  process.exit(1);
});
