import { describe, expect, it } from 'vitest';
import { browserLabel } from '@/lib/ui/browser-label';

// User-Agent strings in the shapes the browsers send them (common practice: each names its product token,
// and Chromium-based browsers also say "Chrome" and "Safari").
const agents = {
  chromeAndroid:
    'Mozilla/5.0 (Linux; Android 14; Pixel 8) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/131.0.0.0 Mobile Safari/537.36',
  safariIphone:
    'Mozilla/5.0 (iPhone; CPU iPhone OS 17_5 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.5 Mobile/15E148 Safari/604.1',
  chromeIphone:
    'Mozilla/5.0 (iPhone; CPU iPhone OS 17_5 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) CriOS/131.0.0.0 Mobile/15E148 Safari/604.1',
  firefoxWindows: 'Mozilla/5.0 (Windows NT 10.0; Win64; x64; rv:133.0) Gecko/20100101 Firefox/133.0',
  edgeWindows:
    'Mozilla/5.0 (Windows NT 10.0; Win64; x64) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/131.0.0.0 Safari/537.36 Edg/131.0.0.0',
  safariMac:
    'Mozilla/5.0 (Macintosh; Intel Mac OS X 10_15_7) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.5 Safari/605.1.15',
  headlessLinux:
    'Mozilla/5.0 (X11; Linux x86_64) AppleWebKit/537.36 (KHTML, like Gecko) HeadlessChrome/131.0.0.0 Safari/537.36',
  samsung:
    'Mozilla/5.0 (Linux; Android 14; SM-S918B) AppleWebKit/537.36 (KHTML, like Gecko) SamsungBrowser/26.0 Chrome/122.0.0.0 Mobile Safari/537.36',
};

describe('browserLabel', () => {
  it('names the browser and the system', () => {
    expect(browserLabel(agents.chromeAndroid)).toBe('Chrome on Android');
    expect(browserLabel(agents.safariIphone)).toBe('Safari on iOS');
    expect(browserLabel(agents.chromeIphone)).toBe('Chrome on iOS');
    expect(browserLabel(agents.firefoxWindows)).toBe('Firefox on Windows');
    expect(browserLabel(agents.safariMac)).toBe('Safari on Mac');
    expect(browserLabel(agents.headlessLinux)).toBe('Chrome on Linux');
  });

  it('tells browsers built on Chromium from Chrome', () => {
    expect(browserLabel(agents.edgeWindows)).toBe('Edge on Windows');
    expect(browserLabel(agents.samsung)).toBe('Samsung Internet on Android');
  });

  it('names other clients by their first product token, and says when there was none', () => {
    expect(browserLabel('curl/8.5.0')).toBe('curl');
    expect(browserLabel(null)).toBe('Unknown browser');
    expect(browserLabel('   ')).toBe('Unknown browser');
  });
});
