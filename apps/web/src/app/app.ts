import { ChangeDetectionStrategy, Component } from '@angular/core';
import { Shell } from './layout/shell/shell';

@Component({
  selector: 'bw-root',
  imports: [Shell],
  template: '<bw-shell />',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {}
