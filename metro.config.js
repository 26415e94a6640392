/* global require, module, __dirname */
// Metro for the web client. In development (`expo start --web`) same-origin /api calls are passed on to
// the Express API so the session cookie works exactly as in production; `expo export` ignores this file.
const http = require('node:http');
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
