// `npm run db:stop`: stops the project's own MariaDB (data in .data/ is kept).
import { stopDatabase } from "./lib/env.mjs";

stopDatabase();
