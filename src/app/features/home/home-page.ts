import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { catchError, map, of } from 'rxjs';
import { LotCard } from '../catalogue/lot-card/lot-card';
import { LotsApi } from '../catalogue/lots-api';

@Component({
  selector: 'app-home-page',
  imports: [RouterLink, MatButton, LotCard],
  templateUrl: './home-page.html',
  styleUrl: './home-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HomePage {
  protected readonly latest = toSignal(
    inject(LotsApi)
      .search({ sort: 'newest', pageSize: '6' })
      .pipe(
        map((r) => r.items),
        catchError(() => of([])),
      ),
    { initialValue: [] },
  );
}
