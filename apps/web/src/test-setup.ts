// Angular's npm packages are partially compiled; outside the Angular builder the JIT compiler finishes them.
import '@angular/compiler';
