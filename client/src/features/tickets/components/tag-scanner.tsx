import { Alert, Box, Button, Stack, Text } from '@mantine/core';
import { IconCameraOff } from '@tabler/icons-react';
import type QrScannerType from 'qr-scanner';
import { useEffect, useRef, useState } from 'react';
import { readTagCode } from './read-tag-code';

export type ScanProblem = 'unavailable' | 'no-camera' | 'denied' | 'insecure' | 'failed';

const PROBLEM_TEXT: Record<ScanProblem, { title: string; text: string }> = {
  unavailable: {
    title: 'The scanner could not load',
    text: 'Check the connection, or type the tag code above.',
  },
  'no-camera': { title: 'No camera on this device', text: 'Type the tag code above instead.' },
  denied: {
    title: 'The camera is not allowed',
    text: 'Allow the camera for Keenroute in the browser’s site settings, or type the tag code above.',
  },
  insecure: {
    title: 'The camera needs a secure page',
    text: 'Browsers open the camera only on https pages. Type the tag code above instead.',
  },
  failed: {
    title: 'The camera did not start',
    text: 'Another app may be using it, or permission was refused. Type the tag code above instead.',
  },
};

async function whyNotStarted(): Promise<ScanProblem> {
  if (window.isSecureContext === false) return 'insecure';
  try {
    // Not every browser can ask about the camera; where it cannot, the general message stays.
    const status = await navigator.permissions?.query({ name: 'camera' });
    if (status?.state === 'denied') return 'denied';
  } catch {
    return 'failed';
  }
  return 'failed';
}

/** The phone's camera reading tag labels; the package loads only when someone taps Scan. */
export function TagScanner({ onCode, onClose }: { onCode: (tagCode: string) => void; onClose: () => void }) {
  const video = useRef<HTMLVideoElement>(null);
  const latestOnCode = useRef(onCode);
  const [problem, setProblem] = useState<ScanProblem | null>(null);
  const [running, setRunning] = useState(false);
  const [unreadable, setUnreadable] = useState<string | null>(null);

  useEffect(() => {
    latestOnCode.current = onCode;
  }, [onCode]);

  useEffect(() => {
    let scanner: QrScannerType | null = null;
    let stopped = false;
    const start = async () => {
      let QrScanner: typeof QrScannerType;
      try {
        QrScanner = (await import('qr-scanner')).default;
      } catch {
        setProblem('unavailable');
        return;
      }
      if (stopped || !video.current) return;
      if (!(await QrScanner.hasCamera())) {
        setProblem('no-camera');
        return;
      }
      const found = new QrScanner(
        video.current,
        (result) => {
          const code = readTagCode(result.data);
          if (!code) {
            setUnreadable(result.data);
            return;
          }
          found.stop();
          latestOnCode.current(code);
        },
        { returnDetailedScanResult: true, preferredCamera: 'environment', highlightScanRegion: true },
      );
      scanner = found;
      try {
        await found.start();
        if (!stopped) setRunning(true);
      } catch {
        if (!stopped) setProblem(await whyNotStarted());
      }
    };
    void start();
    return () => {
      stopped = true;
      scanner?.destroy();
    };
  }, []);

  if (problem) {
    const { title, text } = PROBLEM_TEXT[problem];
    return (
      <Alert color="gray" icon={<IconCameraOff size={20} aria-hidden="true" />} title={title} role="alert">
        <Stack gap="xs" align="flex-start">
          <Text size="sm">{text}</Text>
          <Button variant="default" mih={44} onClick={onClose}>
            Close the scanner
          </Button>
        </Stack>
      </Alert>
    );
  }
  return (
    <Stack gap="xs">
      <Box
        pos="relative"
        bg="dark.8"
        style={{ borderRadius: 'var(--mantine-radius-md)', overflow: 'hidden', aspectRatio: '4 / 3' }}
      >
        <video ref={video} aria-label="Camera view" muted playsInline style={{ width: '100%', height: '100%' }} />
      </Box>
      <Text size="sm" c="dimmed" role="status">
        {running ? 'Point the camera at the tag’s QR code.' : 'Starting the camera…'}
        {unreadable ? ` That code is not a Keenroute tag (${unreadable.slice(0, 40)}).` : ''}
      </Text>
      <Button variant="default" mih={44} onClick={onClose}>
        Stop scanning
      </Button>
    </Stack>
  );
}
