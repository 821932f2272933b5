import { HttpClient } from '@angular/common/http';
import { afterNextRender, ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { RouterLink } from '@angular/router';
import { geoAlbers, geoCircle, geoPath, type GeoPermissibleObjects } from 'd3-geo';
import type { Feature, FeatureCollection, Geometry } from 'geojson';
import { feature } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';

export interface MapLot {
  id: number;
  title: string;
  lat: number;
  lon: number;
}

/** FIPS codes of the states and territories outside the lower 48 (Alaska, Hawaii, Puerto Rico and the islands). */
const OUTSIDE_LOWER_48 = new Set(['02', '15', '60', '66', '69', '72', '78']);
/** Statute miles per degree of a great circle (Earth's mean radius 3,958.8 mi × π / 180). */
const MILES_PER_DEGREE = 69.09;
const W = 600;
const H = 380;

/**
 * The lower 48 states, drawn offline from us-atlas (served by the app at /geo), with the lots as numbered points
 * and the buyer's search radius as a circle. Drawn in the browser after the first render; the list beside it
 * carries the same lots for anyone who cannot see the map.
 */
@Component({
  selector: 'app-lot-map',
  imports: [RouterLink],
  template: `
    <figure class="map">
      <svg [attr.viewBox]="'0 0 ' + w + ' ' + h" role="img" [attr.aria-label]="summary()">
        @if (states(); as s) {
          @for (d of s; track $index) { <path [attr.d]="d" class="state" /> }
        }
        @if (radiusPath(); as r) { <path [attr.d]="r" class="radius" /> }
        @if (originPoint(); as o) { <g [attr.transform]="'translate(' + o[0] + ',' + o[1] + ')'"><path d="M-7 0 L7 0 M0 -7 L0 7" class="origin" /></g> }
        @for (p of points(); track p.id) {
          <a [attr.href]="'/hay/' + p.id" [attr.aria-label]="p.title">
            <g [attr.transform]="'translate(' + p.x + ',' + p.y + ')'">
              <circle r="8" class="lot" />
              <text y="3.5" class="no">{{ p.n }}</text>
            </g>
          </a>
        }
      </svg>
      <figcaption>
        @if (!states()) { Loading the map… }
        Lots on this page, numbered as listed@if (radiusMi() && origin()) {; the circle is {{ radiusMi() }} mi around {{ origin()!.label }}}.
        Points are placed near the farm's town, not at the barn.
      </figcaption>
      <ol class="legend">
        @for (p of points(); track p.id) { <li><a [routerLink]="['/hay', p.id]">{{ p.n }}. {{ p.title }}</a></li> }
      </ol>
    </figure>
  `,
  styles: `
    .map { margin: 0 0 16px; padding: 8px; background: var(--bp-tag); border: 1.5px solid var(--bp-ink); }
    svg { width: 100%; height: auto; display: block; }
    .state { fill: var(--bp-oat); stroke: var(--bp-rule); stroke-width: 0.8; }
    .radius { fill: color-mix(in srgb, var(--bp-sorrel) 12%, transparent); stroke: var(--bp-sorrel); stroke-width: 1.5; stroke-dasharray: 4 3; }
    .origin { stroke: var(--bp-sorrel); stroke-width: 2.5; }
    .lot { fill: var(--bp-ink); stroke: var(--bp-tag); stroke-width: 1.5; }
    .no { fill: var(--bp-tag); font-size: 9px; font-weight: 700; text-anchor: middle; }
    figcaption { font-size: var(--bp-text-xs); color: var(--bp-muted); margin-top: 4px; }
    .legend { columns: 2 220px; font-size: var(--bp-text-sm); margin: 6px 0 0; padding-left: 0; list-style: none; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotMap {
  private readonly http = inject(HttpClient);
  readonly lots = input.required<MapLot[]>();
  readonly origin = input<{ lat: number; lon: number; label: string } | null>(null);
  readonly radiusMi = input<number | null>(null);

  protected readonly w = W;
  protected readonly h = H;
  private readonly lower48 = signal<FeatureCollection<Geometry> | null>(null);

  private readonly projection = computed(() => {
    const land = this.lower48();
    return land ? geoAlbers().fitSize([W, H], land) : null;
  });
  protected readonly states = computed(() => {
    const projection = this.projection();
    const land = this.lower48();
    if (!projection || !land) return null;
    const path = geoPath(projection);
    return land.features.map((f) => path(f) ?? '');
  });
  protected readonly points = computed(() => {
    const projection = this.projection();
    if (!projection) return [];
    return this.lots()
      .map((l, i) => ({ ...l, n: i + 1, xy: projection([l.lon, l.lat]) }))
      .filter((p): p is typeof p & { xy: [number, number] } => p.xy !== null)
      .map((p) => ({ id: p.id, title: p.title, n: p.n, x: p.xy[0], y: p.xy[1] }));
  });
  protected readonly originPoint = computed(() => {
    const o = this.origin();
    const projection = this.projection();
    return o && projection ? projection([o.lon, o.lat]) : null;
  });
  protected readonly radiusPath = computed(() => {
    const o = this.origin();
    const r = this.radiusMi();
    const projection = this.projection();
    if (!o || !r || !projection) return null;
    const circle = geoCircle().center([o.lon, o.lat]).radius(r / MILES_PER_DEGREE)();
    return geoPath(projection)(circle as GeoPermissibleObjects);
  });
  protected readonly summary = computed(() => {
    const o = this.origin();
    const r = this.radiusMi();
    return `Map of the lower 48 states with ${this.lots().length} lots` + (o && r ? ` and a ${r} mile circle around ${o.label}` : '') + '.';
  });

  constructor() {
    afterNextRender(() => {
      this.http.get<Topology<{ states: GeometryCollection }>>('/geo/states-10m.json').subscribe((topology) => {
        const all = feature(topology, topology.objects.states) as FeatureCollection<Geometry>;
        this.lower48.set({ type: 'FeatureCollection', features: all.features.filter((f: Feature) => !OUTSIDE_LOWER_48.has(String(f.id))) });
      });
    });
  }
}
