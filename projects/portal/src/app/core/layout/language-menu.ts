import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { TranslatePipe } from '@ngx-translate/core';
import type { Language as LanguageCode, PortalClient } from '@layerbook/contracts/types';

/** One choice of the menu: the client's own language, or null to follow the firm's. */
export interface LanguageChoiceItem {
  readonly value: LanguageCode | null;
  /** words key, with params for the firm's choice ("Same as Quillfeather (Español)") */
  readonly label: string;
  readonly params: Readonly<Record<string, string>>;
  readonly isChosen: boolean;
}

/**
 * The three choices, the one the client made marked: English, Español, or the firm's language
 * (null). Naming the firm and its language tells a client who follows it why they read what they read.
 * `languageName` gives a language's own name ("Español"), as the menu shows it.
 */
export function languageChoices(
  client: Pick<PortalClient, 'firmName' | 'ownLanguage' | 'firmLanguage'>,
  languageName: (code: LanguageCode) => string,
): LanguageChoiceItem[] {
  const own = (value: LanguageCode): LanguageChoiceItem => ({
    value,
    label: `common.languageNames.${value}`,
    params: {},
    isChosen: client.ownLanguage === value,
  });
  return [
    own('en'),
    own('es'),
    {
      value: null,
      label: 'layout.shell.followFirm',
      params: { firm: client.firmName, language: languageName(client.firmLanguage) },
      isChosen: client.ownLanguage === null,
    },
  ];
}

/** The portal's language menu: the button names the language shown; the menu marks the client's own choice. */
@Component({
  selector: 'lb-language-menu',
  imports: [MatButtonModule, MatIconModule, MatMenuModule, TranslatePipe],
  template: `
    <button mat-button type="button" class="on-dark" [matMenuTriggerFor]="languageMenu">
      <mat-icon aria-hidden="true">translate</mat-icon>
      {{ 'common.languageNames.' + client().language | translate }}
    </button>
    <mat-menu #languageMenu="matMenu" [aria-label]="'layout.shell.language' | translate">
      @for (choice of choices(); track choice.label) {
        <button
          mat-menu-item
          type="button"
          role="menuitemradio"
          [attr.aria-checked]="choice.isChosen"
          [class.chosen]="choice.isChosen"
          (click)="choose.emit(choice.value)"
        >
          <mat-icon aria-hidden="true">{{ choice.isChosen ? 'check' : '' }}</mat-icon>
          <span>{{ choice.label | translate: choice.params }}</span>
        </button>
      }
    </mat-menu>
  `,
  styles: `
    .on-dark {
      --mat-button-text-label-text-color: var(--lb-ivory);
    }
    .chosen {
      font-weight: 600;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LanguageMenu {
  readonly client = input.required<Pick<PortalClient, 'firmName' | 'language' | 'ownLanguage' | 'firmLanguage'>>();
  /** the client's choice: a language of their own, or null to follow the firm's */
  readonly choose = output<LanguageCode | null>();

  /** Language names are each in itself (common.languageNames), so they need no translating service here. */
  private readonly names: Readonly<Record<LanguageCode, string>> = { en: 'English', es: 'Español' };
  protected readonly choices = computed(() => languageChoices(this.client(), (code) => this.names[code]));
}
