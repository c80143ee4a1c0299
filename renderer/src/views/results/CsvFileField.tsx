/** The "File" field of a CSV import form: the picked file's text and name go to the form (the file itself stays where it is). */
import { Field } from '../../components/Field';

/** Reads a file the user picked into text. */
async function readPickedFile(input: HTMLInputElement): Promise<{ name: string; text: string } | null> {
  const file = input.files?.[0];
  if (!file) return null;
  return { name: file.name, text: await file.text() };
}

export function CsvFileField(props: { name: string; onPicked: (file: { name: string; text: string }) => void }) {
  return (
    <Field label="File" name={props.name}>
      <input
        type="file"
        name={props.name}
        accept=".csv,.txt,.tsv"
        onChange={async (event) => {
          const picked = await readPickedFile(event.target);
          if (picked) props.onPicked(picked);
        }}
      />
    </Field>
  );
}
