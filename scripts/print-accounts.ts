// Prints the demo accounts as a table (used by `npm start`).
import { DEMO_ACCOUNTS, DEMO_ORGANISATION } from "@/lib/demo/accounts";
import { ROLE_LABELS } from "@/lib/auth/roles";

console.log(`\nDemo organisation: ${DEMO_ORGANISATION}`);
console.log(["role".padEnd(18), "e-mail".padEnd(32), "password"].join(""));
for (const a of DEMO_ACCOUNTS) console.log([ROLE_LABELS[a.role].padEnd(18), a.email.padEnd(32), a.password].join(""));
