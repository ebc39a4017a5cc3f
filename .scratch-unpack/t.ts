const t=performance.now();
await import('sharp'); console.log('sharp', performance.now()-t);
await import('ag-psd'); console.log('agpsd', performance.now()-t);
await import('zod'); console.log('zod', performance.now()-t);
await import('../server/features/originals/unpack/unpack-original'); console.log('all', performance.now()-t);
