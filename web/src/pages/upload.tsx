import { useNavigate } from 'react-router-dom';
import { UploadPanel } from '../components/upload-panel.js';

export function UploadPage() {
  const navigate = useNavigate();
  return (
    <section aria-labelledby="upload-title" className="max-w-3xl">
      <h1 id="upload-title" className="mb-4">
        Upload patterns
      </h1>
      <UploadPanel onSaved={(items) => navigate(items.length === 1 ? `/patterns/${items[0]!.id}` : '/library')} />
    </section>
  );
}
