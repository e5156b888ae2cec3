// What every browser test and the editor benchmark launch: Debian's chromium (never a downloaded
// browser) with the flags that keep it off the network, and where screenshots go for people to look at.
import path from 'node:path'

export const CHROMIUM_PATH = '/usr/bin/chromium'

/** Without the background-networking flags chromium keeps trying hosts this machine cannot reach. */
export const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
  '--disable-background-networking', '--disable-component-update', '--disable-sync']

export const SCREENSHOTS_DIR = path.resolve(import.meta.dirname, '../../.data/test-output/screenshots')

/** Share of the time-current chart canvas's pixels that are not white (the plot, its lines and
 * labels). An expression for page.evaluate: it runs in the page. */
export const INKED_SHARE = `(() => {
  const c = document.querySelector('[data-test="time-current-canvas"]')
  const { data } = c.getContext('2d').getImageData(0, 0, c.width, c.height)
  let inked = 0
  for (let i = 0; i < data.length; i += 4) if (data[i] < 235 || data[i + 1] < 235 || data[i + 2] < 235) inked++
  return inked / (data.length / 4)
})()`
