import { Inject } from '@nestjs/common';
import type { AppConfig } from './config.schema.js';

/** Injection token for the validated settings. */
export const APP_CONFIG = Symbol('APP_CONFIG');
export const InjectConfig = () => Inject(APP_CONFIG);
export type { AppConfig };
