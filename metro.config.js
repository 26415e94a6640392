/* global require, module, __dirname */
// Metro for the web client. In development (`expo start --web`) same-origin /api calls are passed on to
// the Express API so the session cookie works exactly as in production; `expo export` ignores this file.
const http = require('node:http');
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
const apiPort = Number(process.env.API_PORT ?? 8080);

function proxyToApi(req, res) {
  const upstream = http.request(
    { host: '127.0.0.1', port: apiPort, path: req.url, method: req.method, headers: req.headers },
    (answer) => {
      res.writeHead(answer.statusCode ?? 502, answer.headers);
      answer.pipe(res);
    },
  );
  upstream.on('error', () => {
    res.writeHead(502, { 'Content-Type': 'application/json' });
    res.end(
      JSON.stringify({ error: { code: 'internal', message: `The API is not running on port ${apiPort}` } }),
    );
  });
  req.pipe(upstream);
}

// zod's classic and mini builds import every language's messages as `z.locales`; the web build takes the
// English ones only (see metro/zod-english-only.js). Its schema compiler and JSON Schema reader, unused by
// the app, are left out (see metro/zod-web-omitted.js).
const zodEnglishOnly = path.join(__dirname, 'metro', 'zod-english-only.js');
const zodWebOmitted = path.join(__dirname, 'metro', 'zod-web-omitted.js');
const zodBuild = /[\\/]zod[\\/]v4[\\/](classic|mini|core)[\\/]/;
const upstreamResolve = config.resolver.resolveRequest;
config.resolver.resolveRequest = (context, moduleName, platform) => {
  if (
    platform === 'web' &&
    /^\.\.\/locales\/index\.c?js$/.test(moduleName) &&
    zodBuild.test(context.originModulePath)
  )
    return { type: 'sourceFile', filePath: zodEnglishOnly };
  if (
    platform === 'web' &&
    /^\.\/(compile|from-json-schema)\.c?js$/.test(moduleName) &&
    zodBuild.test(context.originModulePath)
  )
    return { type: 'sourceFile', filePath: zodWebOmitted };
  return upstreamResolve
    ? upstreamResolve(context, moduleName, platform)
    : context.resolveRequest(context, moduleName, platform);
};

// The first screen (sign-in) loads the entry and the common chunk of modules shared by route chunks. Only
// what the root layout, the home redirect and the signed-out screens need goes into that common chunk; a
// module shared by other routes only is copied into each of their chunks (read by the serializer patch in
// patches/@expo+metro-config*.patch).
config.serializer = {
  ...config.serializer,
  commonChunkFrom: [/[\\/]app[\\/]_layout\.tsx$/, /[\\/]app[\\/]index\.tsx$/, /[\\/]app[\\/]\(auth\)[\\/]/],
};

const expoEnhance = config.server?.enhanceMiddleware;

config.server = {
  ...config.server,
  enhanceMiddleware: (metroMiddleware, server) => {
    const original = expoEnhance ? expoEnhance(metroMiddleware, server) : metroMiddleware;
    return (req, res, next) => {
      if (req.url === '/api' || req.url?.startsWith('/api/')) return proxyToApi(req, res);
      return original(req, res, next);
    };
  },
};

module.exports = config;
