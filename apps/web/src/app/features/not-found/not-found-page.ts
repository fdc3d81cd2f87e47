import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';

@Component({
  selector: 'bw-not-found-page',
  imports: [RouterLink, MatButtonModule],
  template: `
    <section class="bw-page bw-page--medium" aria-labelledby="not-found-title">
      <h1 id="not-found-title">Page not found</h1>
      <p class="bw-lede">There is nothing at this address. The link may be old, or the page may need a different account.</p>
      <a mat-flat-button class="bw-brass" routerLink="/" data-testid="not-found-home">Go to the home page</a>
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotFoundPage {}
