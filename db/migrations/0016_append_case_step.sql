-- The guarded step insert of an answer, in one round trip. Two statements, in this order:
--  1. Lock order, as for undo and finish: the case row first (for update, without writing it), and
--     only while the case is open and the shop's diagnosis settings and the tree's likelihood
--     setting are still those the ranking was worked out with.
--  2. Holding it, the insert, only if the step the ranking followed is still the last one. In READ
--     COMMITTED each statement of a volatile function takes a fresh snapshot, so an answer or undo
--     that committed while statement 1 waited for the lock is seen here.
-- No row when a guard refused the step. unique(case_id, seq) stays the last line.
CREATE OR REPLACE FUNCTION rootbench_append_case_step(
  p_case_id integer, p_previous_id integer, p_seq integer, p_node_id integer, p_option_id integer,
  p_user_id text, p_ranking jsonb, p_settings_key text, p_settings_hash text, p_likelihood_mode text
) RETURNS TABLE (step_id integer, step_seq integer, answered_ms double precision)
LANGUAGE plpgsql VOLATILE AS $$
BEGIN
  PERFORM 1 FROM cases c
  WHERE c.id = p_case_id AND c.status = 'open'
    AND (SELECT md5(st.value::text) FROM settings st WHERE st.key = p_settings_key) IS NOT DISTINCT FROM p_settings_hash
    AND (SELECT t.likelihood_mode FROM tree_versions v JOIN trees t ON t.id = v.tree_id WHERE v.id = c.tree_version_id) = p_likelihood_mode
  FOR UPDATE OF c;
  IF NOT FOUND THEN
    RETURN;
  END IF;
  RETURN QUERY
    INSERT INTO case_steps AS s (case_id, seq, node_id, option_id, answered_by, ranking)
    SELECT p_case_id, p_seq, p_node_id, p_option_id, p_user_id, p_ranking
    WHERE (SELECT x.id FROM case_steps x WHERE x.case_id = p_case_id ORDER BY x.seq DESC LIMIT 1) IS NOT DISTINCT FROM p_previous_id
    RETURNING s.id, s.seq, (extract(epoch FROM s.answered_at) * 1000)::float8;
END;
$$;
