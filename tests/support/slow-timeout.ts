// API and browser tests start databases, servers and simulations: allow two minutes per test or hook.
jest.setTimeout(120_000);
