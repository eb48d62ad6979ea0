import { type EnvironmentProviders, Injectable, type Provider, inject } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { Title } from '@angular/platform-browser';
import { type RouterStateSnapshot, TitleStrategy } from '@angular/router';
import { TranslateService } from '@ngx-translate/core';

/**
 * Route `title:`s are translation keys (`layout.titles.today`); the page title follows the current
 * language, also when the person switches it. A title that is not a key shows as written.
 */
@Injectable({ providedIn: 'root' })
export class TranslatedTitle extends TitleStrategy {
  private readonly title = inject(Title);
  private readonly translate = inject(TranslateService);
  private key: string | undefined;

  constructor() {
    super();
    this.translate.onLangChange.pipe(takeUntilDestroyed()).subscribe(() => this.show());
  }

  override updateTitle(snapshot: RouterStateSnapshot): void {
    this.key = this.buildTitle(snapshot);
    this.show();
  }

  private show(): void {
    if (this.key !== undefined) this.title.setTitle(this.translate.instant(this.key) as string);
  }
}

/** For the app config: route titles through the translations. */
export function provideTranslatedTitles(): Array<Provider | EnvironmentProviders> {
  return [{ provide: TitleStrategy, useExisting: TranslatedTitle }];
}
