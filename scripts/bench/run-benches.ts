// `npm run bench`: every speed and memory target, each printed against a peer measured in the
// same run on this machine. Starts its own throwaway Postgres, fake S3 and fake mail.
import { startTestServices } from '../../tests/setup/test-services';
import { benchCompositorDrag } from './compositor-drag-bench';
import { benchUnpack } from './import-bench';
import { benchImportEndToEnd } from './import-end-to-end';
import { benchLibrary } from './library-bench';
import { benchLibraryUi } from './library-ui-bench';
import { benchPrint } from './print-bench';
import { benchSales } from './sales-bench';

const only = new Set(process.argv.slice(2));
const wanted = (name: string) => only.size === 0 || only.has(name);

const services = await startTestServices({ label: 'bench' });
Object.assign(process.env, services.env, { NODE_ENV: 'test' });
try {
  if (wanted('import')) {
    console.log('\n== Import: unpacking against ImageMagick and the ag-psd + sharp floor ==');
    const peers = await benchUnpack();
    console.log('\n== Import end to end (storage, queue row, unpack, S3, DB) ==');
    // BENCH_IMPORT_FILES=card times only the named files end to end
    await benchImportEndToEnd(peers, console.log, process.env.BENCH_IMPORT_FILES?.split(',').filter(Boolean));
  }
  if (wanted('library')) {
    console.log('\n== Library search against a plain Postgres ILIKE ==');
    await benchLibrary();
  }
  if (wanted('library-ui')) {
    console.log('\n== Library page first screen in headless Chromium against an empty studio ==');
    await benchLibraryUi();
  }
  if (wanted('print')) {
    console.log('\n== Print file against sharp composite() of the same layers ==');
    await benchPrint();
  }
  if (wanted('compositor')) {
    console.log('\n== Editor: dragging a placement among 60 in headless Chromium against the idle frame clock ==');
    await benchCompositorDrag();
  }
  if (wanted('sales')) {
    console.log('\n== Sales import: 50,000 rows through the service against csv-parse alone and Postgres COPY ==');
    await benchSales();
  }
} finally {
  await services.stop();
}
