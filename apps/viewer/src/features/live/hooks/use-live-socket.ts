import { useEffect, useState } from 'react';
import { openLiveSocket, type LiveSocket } from '../socket.ts';

/** One socket for as long as the follow-along is open. */
export function useLiveSocket(): LiveSocket {
  const [socket] = useState(openLiveSocket);
  useEffect(() => {
    socket.connect();
    return () => {
      socket.disconnect();
    };
  }, [socket]);
  return socket;
}
