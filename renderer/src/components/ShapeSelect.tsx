/** The particle shape picker of every form: the one shape list, shown in words ("truncated octahedron"). */
import { PARTICLE_SHAPES, shapeLabel, type ParticleShape } from '../../../shared-model/geometry/shapes';

export function ShapeSelect(props: { name: string; value: ParticleShape; onChange: (shape: ParticleShape) => void }) {
  return (
    <select name={props.name} value={props.value} onChange={(e) => props.onChange(e.target.value as ParticleShape)}>
      {PARTICLE_SHAPES.map((shape) => (
        <option key={shape} value={shape}>
          {shapeLabel(shape)}
        </option>
      ))}
    </select>
  );
}
