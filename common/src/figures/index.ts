// Figure presentation shared by the web client (live figures) and the server (snapshot files):
// number formatting, budget colours and canonical JSON. Each kind's spec, table and schemas live in figure-kinds/.
export * from './format';
export * from './budget-colours';
export * from './canonical-json';
