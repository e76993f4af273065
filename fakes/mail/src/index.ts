export { startMailFake } from './server.js';
export type { MailFake, MailFakeOptions } from './server.js';
export type { CapturedMessage, CapturedAttachment } from './store.js';
export { isAddressedTo } from './store.js';
export { PortInUseError } from './listen.js';
export { DEFAULT_MAX_MESSAGE_BYTES } from './smtp.js';
