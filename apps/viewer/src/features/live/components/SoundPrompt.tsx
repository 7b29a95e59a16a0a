import { Button } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';

/** Asked once: phones play sound only after a tap, and a chime is the point of asking. */
export function SoundPrompt({ onYes, onNo }: { onYes: () => void; onNo: () => void }) {
  return (
    <Card as="section" aria-label="Timer sound" padded={false} className="space-y-3 p-4">
      <p className="text-lg">
        <span className="font-bold">Hear a chime when a timer ends?</span> Your phone needs one tap
        from you before it may play sound.
      </p>
      <Button size="hand" onClick={onYes}>
        Turn on sound
      </Button>
      <Button variant="secondary" className="w-full" onClick={onNo}>
        Not now
      </Button>
    </Card>
  );
}
