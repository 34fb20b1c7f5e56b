/**
 * The `--stdio` transport, guarded: when the reader cannot make sense of the stream (a header
 * without a numeric Content-Length, a body that is not a message) it is out of step with the
 * client and nothing after can be trusted. The server then says why on stderr and exits with
 * code 1, so that the client restarts it, instead of staying alive but deaf. (The editor
 * extension uses node IPC, which has no headers; this is for other clients and the tests.)
 */
import { type MessageReader, type MessageWriter, StreamMessageReader, StreamMessageWriter } from 'vscode-languageserver/node';

export function guardedStdio(shutdownReceived: () => boolean): [MessageReader, MessageWriter] | undefined {
  if (!process.argv.includes('--stdio')) return undefined;
  const reader = new StreamMessageReader(process.stdin);
  const writer = new StreamMessageWriter(process.stdout);
  reader.onError((e) => {
    process.stderr.write(`sublevel: the message stream from the client is broken (${e.message.split('\n')[0]}); the server exits so that it can be restarted\n`);
    process.exit(1);
  });
  // As the library does for a plain stream: the client went away.
  reader.onClose(() => process.exit(shutdownReceived() ? 0 : 1));
  return [reader, writer];
}
