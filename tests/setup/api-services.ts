import type { TestProject } from 'vitest/node';
import { startTestServices } from './test-services';
import './provided-context';

// Global setup of the `api` project: services for every API test file, torn down at the end.
// Test files read them with inject('databaseUrl') etc., or from process.env (DATABASE_URL, ...),
// which this project's workers receive.
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const services = await startTestServices({ label: 'api' });
  try {
    project.provide('databaseUrl', services.env.DATABASE_URL);
    project.provide('s3Endpoint', services.env.S3_ENDPOINT);
    project.provide('s3Bucket', services.env.S3_BUCKET);
    project.provide('smtpUrl', services.env.SMTP_URL);
    project.provide('inboxUrl', services.env.MAIL_INBOX_URL);
    // only this project's workers: the e2e project runs its own services in the same vitest process
    project.config.env = { ...project.config.env, ...services.env, NODE_ENV: 'test' };
  } catch (error) {
    await services.stop();
    throw error;
  }
  return () => services.stop();
}
