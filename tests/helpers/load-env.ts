// Loads lib/env.ts the way the server does at start-up and reports what it got; run with tsx by
// tests/unit/lib/env-startup.test.ts under chosen environments.
import { env } from "../../lib/env";

console.log(JSON.stringify({ started: true, s3KeyId: env.S3_ACCESS_KEY_ID }));
