import { provideHttpClient, withInterceptors, withXsrfConfiguration } from '@angular/common/http';
import {
  ApplicationConfig,
  ErrorHandler,
  inject,
  provideAppInitializer,
  provideBrowserGlobalErrorListeners,
  provideZonelessChangeDetection,
} from '@angular/core';
import { MAT_FORM_FIELD_DEFAULT_OPTIONS, MatFormFieldDefaultOptions } from '@angular/material/form-field';
import { provideRouter, TitleStrategy, withComponentInputBinding, withInMemoryScrolling } from '@angular/router';
import { routes } from './app.routes';
import { AuthStore } from './core/auth/auth-store';
import { ConfigStore } from './core/config/config-store';
import { AppErrorHandler } from './core/error-handling/app-error-handler';
import { errorInterceptor } from './core/http/error-interceptor';
import { PageTitleStrategy } from './core/routing/page-title-strategy';

const formFieldDefaults: MatFormFieldDefaultOptions = { appearance: 'outline', subscriptSizing: 'dynamic' };

export const appConfig: ApplicationConfig = {
  providers: [
    provideZonelessChangeDetection(),
    provideBrowserGlobalErrorListeners(),
    { provide: ErrorHandler, useClass: AppErrorHandler },
    provideRouter(routes, withComponentInputBinding(), withInMemoryScrolling({ scrollPositionRestoration: 'top' })),
    { provide: TitleStrategy, useClass: PageTitleStrategy },
    // The server sets XSRF-TOKEN; Angular echoes it as X-XSRF-TOKEN on unsafe same-origin requests.
    provideHttpClient(withInterceptors([errorInterceptor]), withXsrfConfiguration({ cookieName: 'XSRF-TOKEN', headerName: 'X-XSRF-TOKEN' })),
    { provide: MAT_FORM_FIELD_DEFAULT_OPTIONS, useValue: formFieldDefaults },
    // Both GETs also make the server set the XSRF cookie before the first POST; guards rely on `me` being known.
    provideAppInitializer(() => Promise.all([inject(ConfigStore).load(), inject(AuthStore).load()])),
  ],
};
