-- One spelling of particle shapes (shared-model/geometry/shapes.ts): predictions stored before it wrote
-- "truncated octahedron"; they now read "truncated-octahedron", as simulation runs always did.
UPDATE predictions
SET inputs_json = json_set(inputs_json, '$.conditions.shape', 'truncated-octahedron')
WHERE json_extract(inputs_json, '$.conditions.shape') = 'truncated octahedron';

UPDATE predictions
SET result_json = json_set(result_json, '$.shape', 'truncated-octahedron')
WHERE json_extract(result_json, '$.shape') = 'truncated octahedron';
