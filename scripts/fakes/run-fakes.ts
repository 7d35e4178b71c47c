// Starts the local fakes for `npm start`: the SMTP sink and the IPP label printer.
import path from 'node:path';
import { startIppPrinter } from './ipp-printer';
import { startSmtpSink } from './smtp-sink';

async function main(): Promise<void> {
  const root = path.resolve(__dirname, '../..');
  const smtp = await startSmtpSink({ port: Number(process.env.SMTP_PORT ?? 2525), dir: process.env.MAIL_SINK_DIR ?? path.join(root, '.data/dev/mail') });
  console.log(`[fakes] SMTP sink on 127.0.0.1:${smtp.port}, messages in ${path.relative(root, smtp.dir)}`);
  const printer = await startIppPrinter({
    port: Number(process.env.PRINTER_PORT ?? 8631),
    dir: process.env.PRINT_SINK_DIR ?? path.join(root, '.data/dev/printed'),
  });
  console.log(`[fakes] IPP printer at ${printer.url}, documents in ${path.relative(root, printer.dir)}`);
  const stop = async () => {
    await smtp.close();
    await printer.close();
    process.exit(0);
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main().catch((err) => {
  console.error('[fakes]', err);
  process.exit(1);
});
