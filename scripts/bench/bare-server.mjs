// The baseline: a bare socket.io server, no framework, no database. It relays a command to the room it names.
import { createServer } from 'node:http';
import { Server } from 'socket.io';

const http = createServer((req, res) => {
  res.writeHead(req.url === '/health' ? 200 : 404).end();
});
const io = new Server(http, { path: '/socket.io', serveClient: false });
io.on('connection', (socket) => {
  socket.on('join', (room, ack) => {
    void socket.join(room);
    ack({ data: { room } });
  });
  socket.on('cmd', (payload, ack) => {
    io.to(payload.room).emit('event', { ...payload, seq: 0 });
    ack({ data: {} });
  });
});
http.listen(Number(process.env.PORT), '127.0.0.1');
