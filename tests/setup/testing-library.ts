import { cleanup } from '@testing-library/react';
import { afterEach } from 'vitest';

// vitest runs without globals, so Testing Library cannot register its own clean-up: unmount every render here.
afterEach(() => cleanup());
