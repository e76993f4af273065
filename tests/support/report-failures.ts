import { beforeEach } from 'vitest';
import { describeOpenPages } from './browser.js';

// A journey that fails prints what each of its browser pages showed then, so a
// run on another machine says more than "waiting for … timed out".
beforeEach(({ onTestFailed }) => {
  onTestFailed(async () => {
    console.error(`What the open pages showed when the test failed:\n${await describeOpenPages()}`);
  });
});
