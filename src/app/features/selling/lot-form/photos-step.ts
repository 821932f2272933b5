import { CdkDrag, CdkDragDrop, CdkDropList, moveItemInArray } from '@angular/cdk/drag-drop';
import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatProgressBar } from '@angular/material/progress-bar';
import { firstValueFrom, last, tap } from 'rxjs';
import type { PhotoView } from '@shared/contracts/lots';
import type { EditableLot } from '@shared/contracts/selling';
import { apiErrorMessage } from '../../../core/api-error';
import { SellingApi } from '../selling-api';
import { StepSave } from './step-save';
import { Icon } from '../../../shared/ui/icon';

interface UploadRow {
  key: number;
  name: string;
  progress: number;
  error: string;
  done: boolean;
}

const MAX_BYTES = 15 * 1024 * 1024;

/** Step 5: photos — dropped or chosen, uploaded one by one with progress, reordered, one chosen as cover. */
@Component({
  selector: 'app-photos-step',
  imports: [CdkDropList, CdkDrag, MatButton, MatIconButton, Icon, MatProgressBar],
  templateUrl: './photos-step.html',
  styleUrls: ['./step-form.scss', './photos-step.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PhotosStep {
  private readonly api = inject(SellingApi);
  readonly lot = input.required<EditableLot>();
  /** The lot after an upload, reorder or removal (the form keeps it). */
  readonly changed = output<EditableLot>();
  readonly saved = output<EditableLot>();

  protected readonly uploads = signal<UploadRow[]>([]);
  protected readonly dragging = signal(false);
  protected readonly saving = new StepSave();
  private counter = 0;

  protected dropped(event: DragEvent): void {
    event.preventDefault();
    this.dragging.set(false);
    void this.addFiles(Array.from(event.dataTransfer?.files ?? []));
  }

  protected chosen(event: Event): void {
    const inputEl = event.target as HTMLInputElement;
    const files = Array.from(inputEl.files ?? []);
    inputEl.value = '';
    void this.addFiles(files);
  }

  private async addFiles(files: File[]): Promise<void> {
    const rows = files.map((f) => ({ key: ++this.counter, name: f.name, progress: 0, error: '', done: false }));
    this.uploads.update((u) => [...u.filter((r) => !r.done), ...rows]);
    for (const [i, file] of files.entries()) {
      const row = rows[i]!;
      if (file.size > MAX_BYTES) {
        this.patch(row.key, { error: 'Larger than 15 MB: make it smaller and try again.' });
        continue;
      }
      try {
        await firstValueFrom(
          this.api.uploadPhoto(this.lot().id, file).pipe(
            tap((e) => e.kind === 'progress' && this.patch(row.key, { progress: e.progress })),
            last(),
          ),
        );
        this.patch(row.key, { progress: 1, done: true });
      } catch (e) {
        this.patch(row.key, { error: apiErrorMessage(e, 'The upload failed.') });
      }
    }
    this.changed.emit(await firstValueFrom(this.api.lot(this.lot().id)));
  }

  private patch(key: number, change: Partial<UploadRow>): void {
    this.uploads.update((rows) => rows.map((r) => (r.key === key ? { ...r, ...change } : r)));
  }

  protected async reorder(event: CdkDragDrop<PhotoView[]>): Promise<void> {
    const list = [...this.lot().photos];
    moveItemInArray(list, event.previousIndex, event.currentIndex);
    await this.sendOrder(list, this.coverId(list));
  }

  protected async move(index: number, by: -1 | 1): Promise<void> {
    const list = [...this.lot().photos];
    if (index + by < 0 || index + by >= list.length) return;
    moveItemInArray(list, index, index + by);
    await this.sendOrder(list, this.coverId(list));
  }

  protected async makeCover(photo: PhotoView): Promise<void> {
    await this.sendOrder(this.lot().photos, photo.id);
  }

  protected async remove(photo: PhotoView): Promise<void> {
    const lot = await this.saving.run(this.api.removePhoto(this.lot().id, photo.id));
    if (lot) this.changed.emit(lot);
  }

  private coverId(list: PhotoView[]): number {
    return (list.find((p) => p.isCover) ?? list[0]!).id;
  }

  private async sendOrder(list: PhotoView[], coverId: number): Promise<void> {
    const lot = await this.saving.run(this.api.orderPhotos(this.lot().id, { order: list.map((p) => p.id), coverId }));
    if (lot) this.changed.emit(lot);
  }

  protected thumb(photo: PhotoView): string {
    return [...photo.variants].sort((a, b) => a.width - b.width)[0]?.url ?? '';
  }

  protected async save(): Promise<void> {
    const lot = await this.saving.run(this.api.saveStep(this.lot().id, 'photos', {}));
    if (lot) this.saved.emit(lot);
  }
}
