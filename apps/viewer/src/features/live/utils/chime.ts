/** A rising two-note chime, played twice: generated on the phone, no sound file needed. */
const notes = [
  { hz: 659.25, atS: 0 }, // E5
  { hz: 987.77, atS: 0.18 }, // B5
  { hz: 659.25, atS: 0.7 },
  { hz: 987.77, atS: 0.88 },
];
const noteS = 0.5;

export function playChime(context: AudioContext) {
  const start = context.currentTime + 0.02;
  for (const { hz, atS } of notes) {
    const oscillator = context.createOscillator();
    const gain = context.createGain();
    oscillator.type = 'sine';
    oscillator.frequency.value = hz;
    // A soft strike and a bell-like decay; ramps avoid clicks at the edges.
    gain.gain.setValueAtTime(0.0001, start + atS);
    gain.gain.exponentialRampToValueAtTime(0.35, start + atS + 0.015);
    gain.gain.exponentialRampToValueAtTime(0.0001, start + atS + noteS);
    oscillator.connect(gain).connect(context.destination);
    oscillator.start(start + atS);
    oscillator.stop(start + atS + noteS + 0.05);
  }
}

/** The pattern a phone buzzes when a timer ends. */
export const vibrationPatternMs = [300, 150, 300, 150, 300];
