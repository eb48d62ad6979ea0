import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { RouterLink } from '@angular/router';
import { LANGUAGES, type Language as LanguageCode } from '@layerbook/contracts/types';
import { TranslatePipe } from '@ngx-translate/core';
import { Language } from '../../../../../shared/i18n/language';

/**
 * English / Español on the signed-out pages (sign-in, the link, a firm's inquiry form), where no
 * client's own choice is known. Each is a plain link to this page with `?lang=`, so it works before
 * the script loads (the server renders the page in it) and the page's links can carry it on; once
 * the app runs, the words switch at once.
 */
@Component({
  selector: 'lb-language-switch',
  imports: [RouterLink, TranslatePipe],
  template: `
    <nav class="switch" [attr.aria-label]="'layout.shell.language' | translate">
      @for (code of languages; track code) {
        @if (code === language.current()) {
          <span [attr.lang]="code" aria-current="true">{{ 'common.languageNames.' + code | translate }}</span>
        } @else {
          <a
            [routerLink]="[]"
            [queryParams]="{ lang: code }"
            queryParamsHandling="merge"
            [attr.lang]="code"
            [attr.hreflang]="code"
            (click)="choose(code)"
            >{{ 'common.languageNames.' + code | translate }}</a
          >
        }
      }
    </nav>
  `,
  styles: `
    .switch {
      display: flex;
      gap: 1rem;
      justify-content: center;
      margin-top: 1.5rem;
      font-size: 0.9rem;
    }
    span {
      font-weight: 600;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LanguageSwitch {
  protected readonly language = inject(Language);
  protected readonly languages = LANGUAGES;

  protected choose(code: LanguageCode): void {
    void this.language.use(code);
  }
}
