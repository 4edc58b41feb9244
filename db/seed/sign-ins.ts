/** Prints the demo sign-ins (used by docker-free-scripts/start). */
import { ROLE_LABELS } from "@/components/ui/roles";
import { DEMO_PEOPLE } from "./people";

const lines = DEMO_PEOPLE.map(
  (p) => `    ${p.email.padEnd(36)} ${p.password.padEnd(18)} ${p.roles.map((r) => ROLE_LABELS[r]).join(", ")}`,
);
process.stdout.write(`  Demo sign-ins (e-mail, password, roles):\n${lines.join("\n")}\n`);
