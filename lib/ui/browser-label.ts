/** Browsers by the product token that names them, checked in this order (Edge and Opera also say Chrome). */
const browsers: [RegExp, string][] = [
  [/\bEdg(e|A|iOS)?\//, 'Edge'],
  [/\b(OPR|Opera)\//, 'Opera'],
  [/\bSamsungBrowser\//, 'Samsung Internet'],
  [/\b(Firefox|FxiOS)\//, 'Firefox'],
  [/\b(HeadlessChrome|Chrome|CriOS|Chromium)\//, 'Chrome'],
  [/\bVersion\/[\d.]+.*Safari\//, 'Safari'],
];

/** Systems, checked in this order (an iPhone's User-Agent also says "like Mac OS X", Android says Linux). */
const systems: [RegExp, string][] = [
  [/\b(iPhone|iPad|iPod)\b/, 'iOS'],
  [/\bAndroid\b/, 'Android'],
  [/\bCrOS\b/, 'ChromeOS'],
  [/\bWindows\b/, 'Windows'],
  [/\bMacintosh\b/, 'Mac'],
  [/\bLinux\b/, 'Linux'],
];

/**
 * A short name for the browser behind a User-Agent header, e.g. "Chrome on Android", so a person can tell
 * their sessions apart. Unknown clients are named by their first product token ("curl").
 */
export function browserLabel(userAgent: string | null): string {
  if (!userAgent?.trim()) return 'Unknown browser';
  const browser = browsers.find(([pattern]) => pattern.test(userAgent))?.[1];
  const system = systems.find(([pattern]) => pattern.test(userAgent))?.[1];
  if (!browser) return userAgent.trim().split(/[\s/]/)[0].slice(0, 40);
  return system ? `${browser} on ${system}` : browser;
}
