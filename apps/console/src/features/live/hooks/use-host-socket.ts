import { useEffect, useState } from 'react';
import { openHostSocket, type LiveSocket } from '../socket.ts';

/** One socket for as long as the board is open. */
export function useHostSocket(): LiveSocket {
  const [socket] = useState(openHostSocket);
  useEffect(() => {
    socket.connect();
    return () => {
      socket.disconnect();
    };
  }, [socket]);
  return socket;
}
