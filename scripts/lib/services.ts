// Starts the local fakes and the production server as child processes with one shared set of ports.
import { existsSync } from "node:fs";
import { serverBuildPath } from "./build-dir";
import { startProcess, waitForHttp } from "./processes";

export interface ServicePorts {
  app: number;
  smtp: number;
  mailHttp: number;
  payments: number;
}

export function appEnv(ports: ServicePorts, databaseUrl: string): NodeJS.ProcessEnv {
  const publicUrl = `http://127.0.0.1:${ports.app}`;
  return {
    NODE_ENV: "production",
    PORT: String(ports.app),
    HOST: "127.0.0.1",
    PUBLIC_URL: process.env.PUBLIC_URL ?? publicUrl,
    DATABASE_URL: databaseUrl,
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(ports.smtp),
    MAIL_FAKE_URL: `http://127.0.0.1:${ports.mailHttp}`,
    ENABLE_DEV_OUTBOX: "true",
    STRIPE_API_URL: `http://127.0.0.1:${ports.payments}`,
    MAIL_SMTP_PORT: String(ports.smtp),
    MAIL_HTTP_PORT: String(ports.mailHttp),
    PAYMENTS_PORT: String(ports.payments),
    WEBHOOK_URL: `${publicUrl}/api/v1/payments/webhook`,
  };
}

const bin = (name: string) => `node_modules/.bin/${name}`;

export async function startFakes(env: NodeJS.ProcessEnv, ports: ServicePorts) {
  startProcess("mail", bin("tsx"), ["fakes/mail-server.ts"], env);
  startProcess("payments", bin("tsx"), ["fakes/payments-server.ts"], env);
  await waitForHttp(`http://127.0.0.1:${ports.mailHttp}/healthz`);
  await waitForHttp(`http://127.0.0.1:${ports.payments}/healthz`);
}

export async function startAppServer(env: NodeJS.ProcessEnv, ports: ServicePorts) {
  const buildPath = serverBuildPath({ ...process.env, ...env });
  if (!existsSync(buildPath)) throw new Error(`No production build at ${buildPath}: run \`npm run build\` first.`);
  const server = startProcess("app", process.execPath, ["--enable-source-maps", "--import", "tsx", "scripts/serve.ts"], env);
  await waitForHttp(`http://127.0.0.1:${ports.app}/healthz`, 30000);
  return server;
}
