-- lot_search holds one row per searchable lot (listed, in stock, with a current analysis). These triggers
-- keep it in step with lots, lab_analyses, sampling_records and farms inside the writing transaction,
-- whichever service writes; the row is rebuilt by the same join the catalogue used to run on every search.
CREATE OR REPLACE FUNCTION lot_search_refresh(p_lot_id integer) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  DELETE FROM lot_search WHERE lot_id = p_lot_id;
  INSERT INTO lot_search (lot_id, farm_id, title, farm_name, published_at, forage_type, bale_type, cutting, harvest_year,
      price_cents_per_ton, price_cents_per_dm_ton, tons_available, rfv, rfq, crude_protein_pct, adf_pct, ndf_pct, nsc_pct,
      sampling_compliant, lab_verified, latitude, longitude)
  SELECT l.id, l.farm_id, l.title, f.name, l.published_at, l.forage_type, l.bale_type, l.cutting,
      extract(year from l.harvest_started_on)::int,
      l.price_cents_per_ton, (l.price_cents_per_ton / (a.dry_matter_pct / 100.0)), (l.bales_available * l.avg_bale_weight_lb / 2000.0),
      a.rfv, a.rfq, a.crude_protein_pct, a.adf_pct, a.ndf_pct, a.nsc_pct,
      coalesce(s.compliant, false), (a.verification = 'verified' AND a.lab_certified), f.latitude, f.longitude
  FROM lots l
  JOIN farms f ON f.id = l.farm_id
  JOIN lab_analyses a ON a.lot_id = l.id AND a.is_current
  LEFT JOIN sampling_records s ON s.lot_id = l.id
  WHERE l.id = p_lot_id AND l.status = 'listed' AND l.bales_available > 0;
END;
$$;
--> statement-breakpoint
CREATE OR REPLACE FUNCTION lot_search_on_lot_row() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  IF TG_OP = 'DELETE' THEN
    PERFORM lot_search_refresh(OLD.lot_id);
    RETURN OLD;
  END IF;
  IF TG_OP = 'UPDATE' AND OLD.lot_id <> NEW.lot_id THEN
    PERFORM lot_search_refresh(OLD.lot_id);
  END IF;
  PERFORM lot_search_refresh(NEW.lot_id);
  RETURN NEW;
END;
$$;
--> statement-breakpoint
CREATE OR REPLACE FUNCTION lot_search_on_lot() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM lot_search_refresh(NEW.id);
  RETURN NEW;
END;
$$;
--> statement-breakpoint
CREATE OR REPLACE FUNCTION lot_search_on_farm() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM lot_search_refresh(l.id) FROM lots l WHERE l.farm_id = NEW.id;
  RETURN NEW;
END;
$$;
--> statement-breakpoint
-- A page view only bumps view_count (and updated_at): no search figure changes, so no rebuild.
CREATE TRIGGER lot_search_lots_insert AFTER INSERT ON lots FOR EACH ROW EXECUTE FUNCTION lot_search_on_lot();
--> statement-breakpoint
CREATE TRIGGER lot_search_lots_update AFTER UPDATE ON lots FOR EACH ROW
  WHEN ((to_jsonb(OLD) - 'view_count' - 'updated_at') IS DISTINCT FROM (to_jsonb(NEW) - 'view_count' - 'updated_at'))
  EXECUTE FUNCTION lot_search_on_lot();
--> statement-breakpoint
CREATE TRIGGER lot_search_lab_analyses AFTER INSERT OR UPDATE OR DELETE ON lab_analyses FOR EACH ROW EXECUTE FUNCTION lot_search_on_lot_row();
--> statement-breakpoint
CREATE TRIGGER lot_search_sampling_records AFTER INSERT OR UPDATE OR DELETE ON sampling_records FOR EACH ROW EXECUTE FUNCTION lot_search_on_lot_row();
--> statement-breakpoint
CREATE TRIGGER lot_search_farms AFTER UPDATE OF name, latitude, longitude ON farms FOR EACH ROW EXECUTE FUNCTION lot_search_on_farm();
--> statement-breakpoint
SELECT lot_search_refresh(id) FROM lots WHERE status = 'listed';
--> statement-breakpoint
-- Servers keep short-lived caches of anonymous catalogue pages and drop them on this notice, sent when the
-- transaction that changed what a visitor sees commits (page views alone send nothing).
CREATE OR REPLACE FUNCTION catalogue_changed_notify() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM pg_notify('catalogue_changed', TG_TABLE_NAME);
  RETURN NULL;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER catalogue_changed_lots_update AFTER UPDATE ON lots FOR EACH ROW
  WHEN ((to_jsonb(OLD) - 'view_count' - 'updated_at') IS DISTINCT FROM (to_jsonb(NEW) - 'view_count' - 'updated_at'))
  EXECUTE FUNCTION catalogue_changed_notify();
--> statement-breakpoint
CREATE TRIGGER catalogue_changed_lots AFTER INSERT OR DELETE OR TRUNCATE ON lots FOR EACH STATEMENT EXECUTE FUNCTION catalogue_changed_notify();
--> statement-breakpoint
CREATE TRIGGER catalogue_changed_lab_analyses AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON lab_analyses FOR EACH STATEMENT EXECUTE FUNCTION catalogue_changed_notify();
--> statement-breakpoint
CREATE TRIGGER catalogue_changed_sampling_records AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON sampling_records FOR EACH STATEMENT EXECUTE FUNCTION catalogue_changed_notify();
--> statement-breakpoint
CREATE TRIGGER catalogue_changed_photos AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON photos FOR EACH STATEMENT EXECUTE FUNCTION catalogue_changed_notify();
--> statement-breakpoint
CREATE TRIGGER catalogue_changed_farms AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON farms FOR EACH STATEMENT EXECUTE FUNCTION catalogue_changed_notify();
