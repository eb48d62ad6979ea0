import { bootstrapApplication } from '@angular/platform-browser';
import { appConfig } from './app/app.config';
import { App } from './app/app';

// Started in a task of its own: the browser gets a turn between evaluating this script and taking
// over the page (two shorter tasks instead of one long one while a phone loads the page; clicks
// meanwhile are kept by event replay and played after hydration).
setTimeout(() => {
  bootstrapApplication(App, appConfig).catch((err) => console.error(err));
});
