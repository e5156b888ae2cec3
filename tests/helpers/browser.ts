// What every browser test and the editor benchmark launch: Debian's chromium (never a downloaded
// browser) with the flags that keep it off the network, and where screenshots go for people to look at.
import path from 'node:path'

export const CHROMIUM_PATH = '/usr/bin/chromium'

/** Without the background-networking flags chromium keeps trying hosts this machine cannot reach. */
export const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
  '--disable-background-networking', '--disable-component-update', '--disable-sync']

export const SCREENSHOTS_DIR = path.resolve(import.meta.dirname, '../../.data/test-output/screenshots')
