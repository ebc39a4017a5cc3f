// `npm run services`: only the local services, for running the server or tests by hand.
import { startLocalServices } from './local-services';
import { describeError } from './service-error';
import { onShutdown } from './shutdown';

try {
  const services = await startLocalServices();
  onShutdown(() => services.stop());
  for (const line of services.summary) console.log(line);
  console.log('\nEnvironment for the server:');
  for (const [name, value] of Object.entries(services.env)) console.log(`  ${name}=${value}`);
  console.log('\nPress Ctrl-C to stop.');
  setInterval(() => {}, 1 << 30);
} catch (error) {
  console.error(describeError(error));
  process.exit(1);
}
