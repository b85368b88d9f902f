// Metro (the Expo dev server) forwards /api/* to the Express server, so the app under
// `npx expo start --web` talks to the real API on the same origin, cookies and all.
const { getDefaultConfig } = require('expo/metro-config');
const http = require('node:http');

const config = getDefaultConfig(__dirname);
const apiPort = Number(process.env.API_PORT ?? 8080);

function forwardToApi(req, res) {
  const upstream = http.request({ host: '127.0.0.1', port: apiPort, path: req.url, method: req.method, headers: req.headers }, (answer) => {
    res.writeHead(answer.statusCode ?? 502, answer.headers);
    answer.pipe(res);
  });
  upstream.on('error', () => {
    res.writeHead(502, { 'content-type': 'application/json' });
    res.end(JSON.stringify({ error: { code: 'api_unreachable', message: `The API on port ${apiPort} is not answering: run npm start first.` } }));
  });
  req.pipe(upstream);
}

config.server = {
  ...config.server,
  enhanceMiddleware: (metroMiddleware) => (req, res, next) =>
    req.url && req.url.startsWith('/api/') ? forwardToApi(req, res) : metroMiddleware(req, res, next),
};

module.exports = config;
