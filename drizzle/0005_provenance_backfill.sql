-- Provenance of the recurrence analyses made before result_inputs existed, read from what each
-- analysis stored when it was queued: its age model runs and, for a segment, its hypothesis version.
INSERT INTO result_inputs (project_id, result_kind, result_id, input_kind, input_id, input_revision, input_name)
SELECT a.project_id, 'recurrenceAnalysis', a.id, 'ageModelRun', r.id, NULL, s.name
FROM recurrence_analyses a
CROSS JOIN LATERAL (
  SELECT (a.input_snapshot ->> 'ageModelRunId') AS run_id WHERE a.input_snapshot ->> 'kind' = 'site'
  UNION SELECT jsonb_array_elements_text(a.input_snapshot -> 'ageModelRunIds') WHERE a.input_snapshot ->> 'kind' = 'segment'
) ids
JOIN age_model_runs r ON r.id::text = ids.run_id
JOIN sites s ON s.id = r.site_id
ON CONFLICT DO NOTHING;--> statement-breakpoint
INSERT INTO result_inputs (project_id, result_kind, result_id, input_kind, input_id, input_revision, input_name)
SELECT a.project_id, 'recurrenceAnalysis', a.id, 'hypothesis', h.id, a.hypothesis_version, h.name
FROM recurrence_analyses a JOIN hypotheses h ON h.id = a.hypothesis_id
WHERE a.hypothesis_version IS NOT NULL
ON CONFLICT DO NOTHING;
