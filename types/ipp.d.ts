// The parts of the `ipp` package (2.0.1, untyped CommonJS) that Tallyforge uses: message (de)serialisation.
declare module 'ipp' {
  export interface IppMessage {
    version?: string;
    operation?: string;
    statusCode?: string;
    id?: number;
    'operation-attributes-tag'?: Record<string, unknown>;
    'job-attributes-tag'?: Record<string, unknown>;
    'printer-attributes-tag'?: Record<string, unknown>;
    data?: Buffer;
  }
  const ipp: {
    serialize(message: IppMessage): Buffer;
    parse(buffer: Buffer): IppMessage;
  };
  export default ipp;
}
