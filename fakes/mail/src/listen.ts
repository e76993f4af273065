/** Thrown when a port the stand-in needs is taken. */
export class PortInUseError extends Error {
  readonly code = 'EADDRINUSE';
  constructor(
    readonly service: 'smtp' | 'http',
    readonly host: string,
    readonly port: number,
  ) {
    super(`the mail stand-in cannot listen for ${service.toUpperCase()} on ${host}:${port}: the port is already in use`);
  }
}

type Listener = Pick<NodeJS.EventEmitter, 'once' | 'off'> & { listen(port: number, host: string): unknown };

/** Listens and resolves once bound; a taken port becomes a PortInUseError. */
export function listenOn(target: Listener, service: 'smtp' | 'http', port: number, host: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const onError = (err: NodeJS.ErrnoException) => {
      target.off('listening', onListening);
      reject(err.code === 'EADDRINUSE' ? new PortInUseError(service, host, port) : err);
    };
    const onListening = () => {
      target.off('error', onError);
      resolve();
    };
    target.once('error', onError);
    target.once('listening', onListening);
    target.listen(port, host);
  });
}
