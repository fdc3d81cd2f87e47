import { inject } from '@angular/core';
import { CanMatchFn } from '@angular/router';
import { ConfigStore } from '../../core/config/config-store';

/** The mailbox exists only while the server keeps mail locally; otherwise the URL is simply not found. */
export const localMailGuard: CanMatchFn = () => inject(ConfigStore).config().localMail;
