-- A published tree version is frozen: cases walked on it must never change under them.
CREATE OR REPLACE FUNCTION rootbench_refuse_published_version_change() RETURNS trigger AS $$
BEGIN
  IF OLD.state = 'published' THEN
    RAISE EXCEPTION 'tree version % is published and cannot be changed', OLD.id USING ERRCODE = 'RB001';
  END IF;
  RETURN CASE WHEN TG_OP = 'DELETE' THEN OLD ELSE NEW END;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER tree_versions_frozen BEFORE UPDATE OR DELETE ON tree_versions
  FOR EACH ROW EXECUTE FUNCTION rootbench_refuse_published_version_change();
--> statement-breakpoint
CREATE OR REPLACE FUNCTION rootbench_refuse_published_graph_change() RETURNS trigger AS $$
DECLARE
  version_id integer;
  version_state text;
BEGIN
  IF TG_TABLE_NAME = 'option_evidence' THEN
    SELECT o.version_id INTO version_id FROM tree_options o
      WHERE o.id = CASE WHEN TG_OP = 'DELETE' THEN OLD.option_id ELSE NEW.option_id END;
  ELSIF TG_OP = 'DELETE' THEN
    version_id := OLD.version_id;
  ELSE
    version_id := NEW.version_id;
  END IF;
  SELECT state INTO version_state FROM tree_versions WHERE id = version_id;
  IF version_state = 'published' THEN
    RAISE EXCEPTION 'tree version % is published and cannot be changed', version_id USING ERRCODE = 'RB001';
  END IF;
  RETURN CASE WHEN TG_OP = 'DELETE' THEN OLD ELSE NEW END;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER tree_nodes_frozen BEFORE INSERT OR UPDATE OR DELETE ON tree_nodes
  FOR EACH ROW EXECUTE FUNCTION rootbench_refuse_published_graph_change();
--> statement-breakpoint
CREATE TRIGGER tree_options_frozen BEFORE INSERT OR UPDATE OR DELETE ON tree_options
  FOR EACH ROW EXECUTE FUNCTION rootbench_refuse_published_graph_change();
--> statement-breakpoint
CREATE TRIGGER tree_causes_frozen BEFORE INSERT OR UPDATE OR DELETE ON tree_causes
  FOR EACH ROW EXECUTE FUNCTION rootbench_refuse_published_graph_change();
--> statement-breakpoint
CREATE TRIGGER option_evidence_frozen BEFORE INSERT OR UPDATE OR DELETE ON option_evidence
  FOR EACH ROW EXECUTE FUNCTION rootbench_refuse_published_graph_change();
