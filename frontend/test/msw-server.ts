import { setupServer } from 'msw/node';

// No default handlers: each test states the API answers it relies on, so nothing passes by accident.
export const server = setupServer();
