// jsdom component tests: unmount between tests and add DOM matchers-free helpers only.
import { afterEach } from 'vitest';
import { cleanup } from '@testing-library/react';

afterEach(() => cleanup());
